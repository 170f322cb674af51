import { Badge, Flex, Text } from '@radix-ui/themes';
import type { UploadResult, UploadStatus } from '../../../types/api';
import { DiagnosticsList } from './diagnostics-list';

const STATUS_COLOUR: Record<UploadStatus, 'jade' | 'amber' | 'tomato'> = {
  stored: 'jade',
  duplicate: 'amber',
  rejected: 'tomato',
};

export interface UploadResultsProps {
  wellName: string;
  results: readonly UploadResult[];
}

/** Per-file outcome of a LAS upload: status, the server's message and line, and its diagnostics. */
export function UploadResults({ wellName, results }: UploadResultsProps) {
  return (
    <ul className="plain-list upload-results" aria-label={`Upload results for ${wellName}`}>
      {results.map((result, i) => (
        <li key={`${result.fileName}-${i}`} className="upload-results__item">
          <Flex gap="2" align="center" wrap="wrap">
            <Badge color={STATUS_COLOUR[result.status]} variant="soft">
              {result.status}
            </Badge>
            <Text size="2" weight="medium" className="mono">
              {result.fileName}
            </Text>
            {result.message ? (
              <Text size="2" color="gray">
                {result.line != null ? `Line ${result.line}: ` : ''}
                {result.message}
              </Text>
            ) : null}
          </Flex>
          {result.diagnostics.length ? <DiagnosticsList diagnostics={result.diagnostics} label={`Diagnostics for ${result.fileName}`} /> : null}
        </li>
      ))}
    </ul>
  );
}
