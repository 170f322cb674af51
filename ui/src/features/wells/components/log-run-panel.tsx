import { Badge, Card, DataList, Flex, Heading, Text } from '@radix-ui/themes';
import { formatBytes, formatDateTime, formatDepthRange, formatNumber } from '../../../lib/format';
import type { LogRunDetail } from '../../../types/api';
import { CurvesTable } from './curves-table';
import { DiagnosticsList } from './diagnostics-list';

export interface LogRunPanelProps {
  run: LogRunDetail;
}

/** One stored LAS file: what it covers, its curves and what the reader noticed. */
export function LogRunPanel({ run }: LogRunPanelProps) {
  const headingId = `log-run-${run.id}`;
  return (
    <Card size="2" asChild>
      <section aria-labelledby={headingId}>
        <Flex direction="column" gap="3">
          <Flex justify="between" align="center" wrap="wrap" gap="2">
            <Heading as="h3" size="3" id={headingId} className="mono">
              {run.fileName}
            </Heading>
            <Flex gap="2">
              <Badge variant="soft" color="gray">
                LAS {run.lasVersion}
              </Badge>
              {run.wrapped ? (
                <Badge variant="soft" color="gray">
                  wrapped
                </Badge>
              ) : null}
            </Flex>
          </Flex>
          <DataList.Root orientation={{ initial: 'vertical', sm: 'horizontal' }} size="1">
            <DataList.Item>
              <DataList.Label>Interval</DataList.Label>
              <DataList.Value>{formatDepthRange(Math.min(run.start, run.stop), Math.max(run.start, run.stop), run.depthUnit)}</DataList.Value>
            </DataList.Item>
            <DataList.Item>
              <DataList.Label>Step</DataList.Label>
              <DataList.Value>{run.step === null ? 'irregular' : `${formatNumber(run.step)} ${run.depthUnit}`}</DataList.Value>
            </DataList.Item>
            <DataList.Item>
              <DataList.Label>Samples</DataList.Label>
              <DataList.Value>
                {formatNumber(run.rowCount)} rows × {formatNumber(run.curveCount)} curves
              </DataList.Value>
            </DataList.Item>
            <DataList.Item>
              <DataList.Label>Loaded</DataList.Label>
              <DataList.Value>
                {formatDateTime(run.uploadedAt)}
                {run.uploadedByName ? ` by ${run.uploadedByName}` : ''}
              </DataList.Value>
            </DataList.Item>
            <DataList.Item>
              <DataList.Label>File</DataList.Label>
              <DataList.Value>
                <Text className="mono" title={run.sha256}>
                  {formatBytes(run.sizeBytes)} · sha256 {run.sha256.slice(0, 12)}…
                </Text>
              </DataList.Value>
            </DataList.Item>
          </DataList.Root>
          <CurvesTable fileName={run.fileName} curves={run.curves} />
          <Flex direction="column" gap="1">
            <Heading as="h4" size="2">
              Diagnostics
            </Heading>
            {run.diagnostics.length ? (
              <DiagnosticsList diagnostics={run.diagnostics} label={`Diagnostics for ${run.fileName}`} />
            ) : (
              <Text size="1" color="gray">
                The reader raised nothing for this file.
              </Text>
            )}
          </Flex>
        </Flex>
      </section>
    </Card>
  );
}
