import { Badge, Box, Callout, Card, Flex, Heading, Table, Text } from '@radix-ui/themes';
import type { CSSProperties } from 'react';
import { ApiError } from '../../../lib/api-client';
import { useDemoCheck, type DemoCheck, type DemoVolumeRow, type DemoZoneRow } from '../api/get-demo-check';

const numeric: CSSProperties = { fontVariantNumeric: 'tabular-nums', textAlign: 'right', whiteSpace: 'nowrap' };
const scroller: CSSProperties = { maxHeight: 480, overflow: 'auto' };

/** Pass or fail of one row, in words (colour is a second cue, never the only one). */
function Verdict({ pass }: { pass: boolean }) {
  return (
    <Badge color={pass ? 'jade' : 'tomato'} variant="soft">
      {pass ? 'Pass' : 'Fail'}
    </Badge>
  );
}

const fixed = (v: number | null | undefined, digits: number) => (v === null || v === undefined || !Number.isFinite(v) ? '–' : v.toFixed(digits));

/** Gas in Bscf, oil in MMSTB. */
function volume(v: number | null, unit: DemoVolumeRow['unit']): string {
  if (v === null || !Number.isFinite(v)) return '–';
  return unit === 'scf' ? `${(v / 1e9).toFixed(2)} Bscf` : `${(v / 1e6).toFixed(2)} MMSTB`;
}

/** The rows of one zone, side by side: model / evaluated per quantity. */
interface ZoneLine {
  key: string;
  well: string;
  zone: string;
  rows: Partial<Record<DemoZoneRow['quantity'], DemoZoneRow>>;
  pass: boolean;
}

function zoneLines(rows: readonly DemoZoneRow[]): ZoneLine[] {
  const lines = new Map<string, ZoneLine>();
  for (const r of rows) {
    const key = `${r.well}\u0000${r.zone}`;
    const line = lines.get(key) ?? { key, well: r.well, zone: r.zone, rows: {}, pass: true };
    line.rows[r.quantity] = r;
    line.pass &&= r.pass;
    lines.set(key, line);
  }
  return [...lines.values()];
}

function Pair({ row, digits }: { row: DemoZoneRow | undefined; digits: number }) {
  if (!row) return <Text color="gray">–</Text>;
  return (
    <span title={`tolerance ±${row.tolerance.toFixed(digits === 1 ? 2 : 3)}`}>
      {fixed(row.model, digits)} / <Text color={row.pass ? undefined : 'tomato'}>{fixed(row.evaluated, digits)}</Text>
    </span>
  );
}

function ZoneTable({ name, rows }: { name: string; rows: readonly DemoZoneRow[] }) {
  const lines = zoneLines(rows);
  return (
    <Box style={scroller}>
      <Table.Root size="1" variant="surface">
        <caption className="visually-hidden">{name}</caption>
        <Table.Header>
          <Table.Row>
            <Table.ColumnHeaderCell>Well</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Zone</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell style={numeric}>Net reservoir, ft (model / evaluated)</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell style={numeric}>Net pay, ft (model / evaluated)</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell style={numeric}>Mean porosity (model / evaluated)</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell style={numeric}>Mean Sw (model / evaluated)</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Result</Table.ColumnHeaderCell>
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {lines.map((l) => (
            <Table.Row key={l.key}>
              <Table.RowHeaderCell className="nowrap">{l.well}</Table.RowHeaderCell>
              <Table.Cell className="nowrap">{l.zone}</Table.Cell>
              <Table.Cell style={numeric}>
                <Pair row={l.rows['net reservoir']} digits={1} />
              </Table.Cell>
              <Table.Cell style={numeric}>
                <Pair row={l.rows['net pay']} digits={1} />
              </Table.Cell>
              <Table.Cell style={numeric}>
                <Pair row={l.rows['mean porosity']} digits={3} />
              </Table.Cell>
              <Table.Cell style={numeric}>
                <Pair row={l.rows['mean Sw']} digits={3} />
              </Table.Cell>
              <Table.Cell>
                <Verdict pass={l.pass} />
              </Table.Cell>
            </Table.Row>
          ))}
        </Table.Body>
      </Table.Root>
    </Box>
  );
}

function VolumeTable({ rows }: { rows: readonly DemoVolumeRow[] }) {
  return (
    <Table.Root size="1" variant="surface">
      <caption className="visually-hidden">In-place volumes, model vs evaluated</caption>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Accumulation</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Wells</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell style={numeric}>Model in place</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell style={numeric}>Evaluated in place</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell style={numeric}>Difference</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Result</Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {rows.map((v) => (
          <Table.Row key={v.accumulation}>
            <Table.RowHeaderCell>{v.accumulation}</Table.RowHeaderCell>
            <Table.Cell>
              {v.wells.join(', ')}
              {v.missingWells.length ? <Text color="tomato"> (not evaluated: {v.missingWells.join(', ')})</Text> : null}
            </Table.Cell>
            <Table.Cell style={numeric}>{volume(v.model, v.unit)}</Table.Cell>
            <Table.Cell style={numeric}>{volume(v.evaluated, v.unit)}</Table.Cell>
            <Table.Cell style={numeric}>{v.relativeDifference === null ? '–' : `${v.relativeDifference >= 0 ? '+' : ''}${(100 * v.relativeDifference).toFixed(2)}%`}</Table.Cell>
            <Table.Cell>
              <Verdict pass={v.pass} />
            </Table.Cell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}

function Summary({ check }: { check: DemoCheck }) {
  const s = check.summary;
  const failed = s.zoneRows - s.zoneRowsPassed;
  return (
    <Flex direction="column" gap="1">
      <Flex gap="2" wrap="wrap" align="center">
        <Badge size="2" color={s.allPass ? 'jade' : 'tomato'}>
          {s.allPass ? 'Engine recovers the model' : 'Differences outside tolerance'}
        </Badge>
        <Text size="2">
          {s.zoneRowsPassed} of {s.zoneRows} zone comparisons within tolerance{failed ? ` (${failed} outside)` : ''}; {s.volumeRowsPassed} of {s.volumeRows} volumes within{' '}
          {(100 * check.tolerances.volumeRelative).toFixed(0)}%.
        </Text>
      </Flex>
      <Text size="1" color="gray">
        Largest differences: net pay {s.largest.netPayFt.toFixed(2)} ft, net reservoir {s.largest.netReservoirFt.toFixed(2)} ft, porosity {s.largest.porosity.toFixed(4)}, Sw{' '}
        {s.largest.sw.toFixed(4)}, in-place volume {(100 * s.largest.volumeRelative).toFixed(2)}%. Tolerances: thickness {check.tolerances.thickness}, porosity{' '}
        {check.tolerances.porosity}, Sw {check.tolerances.sw}.
      </Text>
    </Flex>
  );
}

/**
 * "Model vs evaluated" on the demo asset: the demo field's logs evaluated with the parameters
 * of the earth model they were generated from, compared zone by zone and volume by volume.
 * Renders nothing on any other asset (the check answers 404 there).
 */
export function DemoCheckPanel({ assetId }: { assetId: string }) {
  const check = useDemoCheck(assetId);
  if (check.isError && check.error instanceof ApiError && check.error.status === 404) return null;
  return (
    <Card size="2" asChild>
      <section aria-labelledby="demo-check-heading">
        <Flex direction="column" gap="3">
          <Heading as="h2" size="4" id="demo-check-heading">
            Model vs evaluated
          </Heading>
          <Text size="2">
            This demo field is invented: its LAS files were generated from a known layered earth model, so the true net pay, porosity, water saturation and volumes of
            every zone are known. Evaluating the stored logs with the model&apos;s own parameters must give them back; this panel shows how closely it does.
          </Text>
          {check.isPending ? (
            <Text size="2" color="gray" role="status">
              Evaluating the demo wells against the model…
            </Text>
          ) : check.isError ? (
            <Callout.Root color="tomato" role="alert">
              <Callout.Text>The check could not run: {check.error.message}</Callout.Text>
            </Callout.Root>
          ) : (
            <>
              <Summary check={check.data} />
              <Heading as="h3" size="3">
                In-place volumes
              </Heading>
              <VolumeTable rows={check.data.volumes} />
              <details>
                <summary>
                  <Text size="2" weight="medium">
                    Formation zones ({check.data.summary.zonesEvaluated} of {check.data.summary.zonesInModel} evaluated)
                  </Text>
                </summary>
                <ZoneTable name="Formation zones, model vs evaluated" rows={check.data.zones.filter((r) => r.zoneKind === 'formation')} />
              </details>
              <details>
                <summary>
                  <Text size="2" weight="medium">
                    Fluid zones (formations cut at the contacts; they feed the volumes)
                  </Text>
                </summary>
                <ZoneTable name="Fluid zones, model vs evaluated" rows={check.data.zones.filter((r) => r.zoneKind === 'fluid')} />
              </details>
              {check.data.notEvaluated.length ? (
                <Flex direction="column" gap="1">
                  <Text size="2" weight="medium">
                    Not evaluated
                  </Text>
                  <ul className="plain-list" aria-label="Zones not evaluated">
                    {check.data.notEvaluated.map((z) => (
                      <li key={`${z.well} ${z.zone}`}>
                        <Text size="2">
                          {z.well} {z.zone}: {z.reason}
                        </Text>
                      </li>
                    ))}
                  </ul>
                </Flex>
              ) : null}
              <details>
                <summary>
                  <Text size="2" weight="medium">
                    What was evaluated, with what
                  </Text>
                </summary>
                <ul>
                  {check.data.basis.map((b) => (
                    <li key={b}>
                      <Text size="2">{b}</Text>
                    </li>
                  ))}
                </ul>
              </details>
            </>
          )}
          <Callout.Root color="amber" variant="surface">
            <Callout.Text>
              Volumes here are estimates from invented data. Classifying and reporting reserves follows the applicable rules (for example SPE-PRMS or the local regulator)
              and needs sign-off by a qualified evaluator.
            </Callout.Text>
          </Callout.Root>
        </Flex>
      </section>
    </Card>
  );
}
