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
}

const LABEL: Record<InterpretationFormat, string> = { csv: 'Export CSV', xlsx: 'Export XLSX', las: 'Export LAS' };

/**
 * Files of one stored version, made by the server: the zone table as CSV or XLSX (units in the
 * header row, provenance block) and the computed curves as LAS 2.0.
 */
export function InterpretationExports({ assetId, wellId, wellName, interpretationId, version, formats = ['csv', 'xlsx', 'las'] }: InterpretationExportsProps) {
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
            aria-label={`${LABEL[f]} of version ${version}`}
            onClick={() =>
              download.run(f, () => exportInterpretation(assetId, wellId, interpretationId, f), `${fileStem(wellName)}-v${version}.${f}`, MIME[f])
            }
          >
            {LABEL[f]}
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
