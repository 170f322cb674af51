import { Badge, Button, Callout, Flex, Heading, Table, Text } from '@radix-ui/themes';
import { useEffect, useMemo, useState } from 'react';
import type { BindingDto, CurveCheckRow } from '../../../types/workbench';
import type { BindingInput } from '../api/bindings';

/** What each binding key feeds, in the words the panel shows. */
export const BINDING_LABELS: Record<string, string> = {
  gr: 'Gamma ray',
  sp: 'SP',
  cali: 'Caliper',
  rhob: 'Bulk density',
  nphi: 'Neutron porosity',
  dt: 'Sonic',
  pe: 'Photoelectric',
  rt: 'Deep resistivity',
  rm: 'Medium resistivity',
  rxo: 'Shallow resistivity',
};

const BINDING_ORDER = ['gr', 'sp', 'cali', 'rt', 'rm', 'rxo', 'rhob', 'nphi', 'dt', 'pe'];

export interface CurveCheckPanelProps {
  depthUnit: string;
  rows: readonly CurveCheckRow[];
  bindings: readonly BindingDto[];
  /** Log run file names by id (for the curve choices). */
  runNames: Readonly<Record<string, string>>;
  canEdit: boolean;
  saving: boolean;
  error: string | null;
  onConfirm: (bindings: BindingInput[]) => void;
}

const pct = (f: number) => `${(f * 100).toFixed(f > 0.995 && f < 1 ? 1 : 0)}%`;
const fmt = (v: number | null) => (v === null || !Number.isFinite(v) ? '–' : String(Number(v.toPrecision(4))));

/**
 * Curve check: each curve's coverage, runs of missing samples and values outside the expected
 * range of its class; then the bindings (which curve feeds each input), proposed from the
 * recognised curve classes until confirmed or overridden here.
 */
export function CurveCheckPanel({ depthUnit, rows, bindings, runNames, canEdit, saving, error, onConfirm }: CurveCheckPanelProps) {
  const initial = useMemo(() => Object.fromEntries(bindings.map((b) => [b.binding, `${b.logRunId}::${b.mnemonic}`])), [bindings]);
  const [choice, setChoice] = useState<Record<string, string>>(initial);
  useEffect(() => setChoice(initial), [initial]);
  const options = rows.map((r) => ({ value: `${r.logRunId}::${r.mnemonic}`, label: `${r.mnemonic} (${r.unit || 'no unit'}) · ${r.fileName ?? runNames[r.logRunId] ?? 'log run'}` }));
  const keys = [...BINDING_ORDER, ...bindings.map((b) => b.binding).filter((k) => !BINDING_ORDER.includes(k))];
  const anyProposed = bindings.some((b) => b.proposed && !b.confirmed);

  return (
    <Flex direction="column" gap="4">
      <section aria-labelledby="curve-check-heading">
        <Heading as="h3" size="3" id="curve-check-heading" mb="2">
          Curve check
        </Heading>
        <Table.Root size="1" variant="surface" className="curve-check">
          <caption className="visually-hidden">Curve check</caption>
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell>Curve</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Coverage</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Null runs</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Out of range</Table.ColumnHeaderCell>
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {rows.map((r) => {
              const rv = r.rangeViolations;
              const longest = r.nullRuns.reduce((m, n) => (n.samples > m.samples ? n : m), { from: NaN, to: NaN, samples: 0 });
              const bad = rv.below + rv.above;
              return (
                <Table.Row key={`${r.logRunId}-${r.mnemonic}`}>
                  <Table.RowHeaderCell>
                    <Text weight="medium" className="mono">
                      {r.mnemonic}
                    </Text>{' '}
                    <Text size="1" color="gray">
                      {r.unit || 'no unit'}
                      {r.curveClass ? ` · ${r.curveClass}` : ''}
                    </Text>
                    <Text as="div" size="1" color="gray">
                      {r.fileName ?? runNames[r.logRunId] ?? ''}
                    </Text>
                  </Table.RowHeaderCell>
                  <Table.Cell>
                    <div className="coverage-bar" aria-hidden="true">
                      <span style={{ width: pct(r.coverage.fraction) }} />
                    </div>
                    <Text size="1">
                      {pct(r.coverage.fraction)} · {fmt(r.coverage.first)}–{fmt(r.coverage.last)} {depthUnit}
                    </Text>
                  </Table.Cell>
                  <Table.Cell>
                    {r.nullRuns.length === 0 ? (
                      <Text size="1" color="gray">
                        none
                      </Text>
                    ) : (
                      <Text size="1">
                        {r.nullRuns.length} run{r.nullRuns.length === 1 ? '' : 's'}; longest {longest.samples} samples ({fmt(longest.from)}–{fmt(longest.to)})
                      </Text>
                    )}
                  </Table.Cell>
                  <Table.Cell>
                    {bad === 0 ? (
                      <Text size="1" color="gray">
                        {rv.expectedMin === null && rv.expectedMax === null ? 'no expected range' : 'none'}
                      </Text>
                    ) : (
                      <Text size="1" color="amber">
                        {rv.below} below, {rv.above} above [{fmt(rv.expectedMin)}, {fmt(rv.expectedMax)}]; seen {fmt(rv.min)}–{fmt(rv.max)}
                      </Text>
                    )}
                  </Table.Cell>
                </Table.Row>
              );
            })}
          </Table.Body>
        </Table.Root>
      </section>

      <section aria-labelledby="bindings-heading">
        <Flex align="center" gap="2" mb="2">
          <Heading as="h3" size="3" id="bindings-heading">
            Curve bindings
          </Heading>
          {anyProposed ? (
            <Badge color="amber" variant="soft">
              proposed, not confirmed
            </Badge>
          ) : null}
        </Flex>
        <div className="bindings-grid">
          {keys.map((k) => {
            const b = bindings.find((x) => x.binding === k);
            return (
              <div key={k} className="zp-field">
                <label htmlFor={`binding-${k}`}>
                  {BINDING_LABELS[k] ?? k} <span className="mono zp-unit">{k.toUpperCase()}</span>
                </label>
                <select
                  id={`binding-${k}`}
                  className="native-select"
                  value={choice[k] ?? ''}
                  disabled={!canEdit}
                  onChange={(e) => setChoice((c) => ({ ...c, [k]: e.currentTarget.value }))}
                >
                  <option value="">not bound</option>
                  {options.map((o) => (
                    <option key={o.value} value={o.value}>
                      {o.label}
                    </option>
                  ))}
                </select>
                {b ? (
                  <span className="zp-hint">{b.confirmed ? 'confirmed' : b.proposed ? 'proposed from the curve class' : ''}</span>
                ) : null}
              </div>
            );
          })}
        </div>
        {error ? (
          <Callout.Root color="tomato" role="alert" mt="2">
            <Callout.Text>{error}</Callout.Text>
          </Callout.Root>
        ) : null}
        {canEdit ? (
          <Button
            mt="3"
            loading={saving}
            onClick={() =>
              onConfirm(
                Object.entries(choice)
                  .filter(([, v]) => v)
                  .map(([binding, v]) => {
                    const [logRunId, mnemonic] = v.split('::');
                    return { binding, logRunId, mnemonic };
                  }),
              )
            }
          >
            Confirm bindings
          </Button>
        ) : null}
      </section>
    </Flex>
  );
}
