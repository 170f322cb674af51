import { Button, Flex, Text } from '@radix-ui/themes';
import { fileStem } from '../../../lib/svg-export';
import { exportInterpretation, MIME, type InterpretationFormat } from '../api/exports';
import { useDownload } from '../hooks/use-download';

export interface InterpretationExportsProps {
  assetId: string;
  wellId: string;
  wellName: string;
  interpretationId: string;
  version: number;
  /** Which files to offer (default all three). */
  formats?: InterpretationFormat[];
  /**
   * 'plain': buttons named "Export CSV", "Export XLSX", "Export LAS" (the latest version, once on
   * the page); 'per-version': short "CSV"... buttons named "Version 3 as CSV" (rows of a version list).
   */
  naming?: 'plain' | 'per-version';
}

const LABEL: Record<InterpretationFormat, string> = { csv: 'Export CSV', xlsx: 'Export XLSX', las: 'Export LAS' };

/**
 * Files of one stored version, made by the server: the zone table as CSV or XLSX (units in the
 * header row, provenance block) and the computed curves as LAS 2.0.
 */
export function InterpretationExports({ assetId, wellId, wellName, interpretationId, version, formats = ['csv', 'xlsx', 'las'], naming = 'plain' }: InterpretationExportsProps) {
  const download = useDownload();
  return (
    <Flex direction="column" gap="1">
      <Flex gap="1" wrap="wrap">
        {formats.map((f) => (
          <Button
            key={f}
            size="1"
            variant="soft"
            loading={download.busy === f}
            aria-label={naming === 'per-version' ? `Version ${version} as ${f.toUpperCase()}` : undefined}
            onClick={() =>
              download.run(f, () => exportInterpretation(assetId, wellId, interpretationId, f), `${fileStem(wellName)}-v${version}.${f}`, MIME[f])
            }
          >
            {naming === 'per-version' ? f.toUpperCase() : LABEL[f]}
          </Button>
        ))}
      </Flex>
      {download.error ? (
        <Text size="1" color="tomato" role="alert">
          {download.error}
        </Text>
      ) : null}
    </Flex>
  );
}
