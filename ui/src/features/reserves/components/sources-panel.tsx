import { Badge, Button, Callout, Flex, Heading, SegmentedControl, Table, Text } from '@radix-ui/themes';
import { useId } from 'react';
import type { CaseInputs, Override, ReservesCase, WellValue } from '../../../types/reserves';
import { useRefreshCaseSources } from '../api/refresh-case-sources';
import { useUpdateReservesCase } from '../api/update-reserves-case';
import { formatFraction, formatSig } from '../utils/format-volume';
import { OverrideDialog } from './override-dialog';

export interface SourcesPanelProps {
  assetId: string;
  reservesCase: ReservesCase;
  /** The user may change the case (engineer/admin, case draft or returned). */
  editable: boolean;
}

const WEIGHTING_HELP = {
  arithmetic: 'Each well counts the same.',
  thickness: 'Porosity weighted by net pay, Sw by pore thickness (phi h).',
  area: 'Each well weighted by the drainage area you give it: net pay by A, porosity by A h, Sw by A h phi.',
} as const;

type Stripped = { value: number; reason: string };
const strip = (o: Override | undefined): Stripped | undefined => (o ? { value: o.value, reason: o.reason } : undefined);

/**
 * Where the case's net pay, porosity and Sw come from: each well's approved interpretation (with
 * version and staleness), per-well overrides with reasons, the weighting and the combined values.
 */
export function SourcesPanel({ assetId, reservesCase: c, editable }: SourcesPanelProps) {
  const id = useId();
  const update = useUpdateReservesCase(assetId, c.id);
  const refresh = useRefreshCaseSources(assetId, c.id);
  const inputs = c.inputs;
  const lengthUnit = inputs.lengthUnit;
  const areaUnit = inputs.areaUnit === 'acre' ? 'acres' : 'km²';
  const wells = new Map((c.combined?.wells ?? []).map((w) => [w.wellId, w]));

  const patchWellOverride = (wellId: string, key: WellValue, next: Stripped | undefined) => {
    const all: NonNullable<Parameters<typeof update.mutate>[0]['inputs']>['wellOverrides'] = {};
    for (const [w, values] of Object.entries(inputs.wellOverrides)) {
      all[w] = { netPay: strip(values.netPay), porosity: strip(values.porosity), sw: strip(values.sw) };
    }
    all[wellId] = { ...(all[wellId] ?? {}), [key]: next };
    for (const w of Object.keys(all)) for (const k of ['netPay', 'porosity', 'sw'] as const) if (!all[w][k]) delete all[w][k];
    update.mutate({ inputs: { wellOverrides: all } });
  };
  const patchCaseOverride = (key: WellValue, next: Stripped | undefined) => {
    const all = { netPay: strip(inputs.overrides.netPay), porosity: strip(inputs.overrides.porosity), sw: strip(inputs.overrides.sw), [key]: next };
    for (const k of ['netPay', 'porosity', 'sw'] as const) if (!all[k]) delete all[k];
    update.mutate({ inputs: { overrides: all } });
  };
  const setArea = (wellId: string, raw: string) => {
    const value = Number(raw);
    const next = { ...inputs.drainageAreas };
    if (raw.trim() === '') delete next[wellId];
    else if (Number.isFinite(value) && value > 0) next[wellId] = value;
    else return;
    if (next[wellId] === inputs.drainageAreas[wellId]) return;
    update.mutate({ inputs: { drainageAreas: next } });
  };

  const fmtPay = (v: number | null | undefined) => (v === null || v === undefined ? '–' : `${formatSig(v)} ${lengthUnit}`);
  const combined = c.combined;
  const valueCell = (wellId: string, key: WellValue, shown: string, computed: number | null) => (
    <Flex gap="2" align="center" justify="end">
      <span className={wells.get(wellId)?.overridden.includes(key) ? 'rc-overridden' : undefined}>{shown}</span>
      {editable ? (
        <OverrideDialog
          subject={`${key === 'netPay' ? 'net pay' : key === 'porosity' ? 'porosity' : 'Sw'} of ${c.sources.find((s) => s.wellId === wellId)?.wellName ?? 'the well'}`}
          unit={key === 'netPay' ? lengthUnit : 'v/v'}
          computed={computed}
          current={inputs.wellOverrides[wellId]?.[key]}
          fraction={key !== 'netPay'}
          onSave={(value, reason) => patchWellOverride(wellId, key, { value, reason })}
          onRemove={() => patchWellOverride(wellId, key, undefined)}
          disabled={update.isPending}
        />
      ) : null}
    </Flex>
  );

  return (
    <Flex direction="column" gap="3" asChild>
      <section aria-labelledby={`${id}-h`}>
        <Heading as="h2" size="4" id={`${id}-h`}>
          Sources: approved net pay of {c.formationName}
        </Heading>
        {c.staleSources ? (
          <Callout.Root color="orange" size="1" role="status">
            <Callout.Text>
              {c.staleSources === 1 ? 'One source is stale' : `${c.staleSources} sources are stale`}: a newer approved interpretation exists. The case still uses the version shown.{' '}
              {editable ? (
                <Button size="1" ml="2" onClick={() => refresh.mutate(undefined)} loading={refresh.isPending}>
                  Refresh sources
                </Button>
              ) : c.status === 'approved' ? (
                'Copy the case to a new draft to refresh it.'
              ) : null}
            </Callout.Text>
          </Callout.Root>
        ) : null}
        <Flex gap="3" align="center" wrap="wrap">
          <Text size="2" weight="medium" id={`${id}-weighting`}>
            Combine wells
          </Text>
          <SegmentedControl.Root
            aria-labelledby={`${id}-weighting`}
            value={inputs.weighting}
            onValueChange={(v) => editable && update.mutate({ inputs: { weighting: v as CaseInputs['weighting'] } })}
            size="1"
            disabled={!editable}
          >
            <SegmentedControl.Item value="arithmetic">
              Arithmetic
            </SegmentedControl.Item>
            <SegmentedControl.Item value="thickness">
              Thickness-weighted
            </SegmentedControl.Item>
            <SegmentedControl.Item value="area">
              Area-weighted
            </SegmentedControl.Item>
          </SegmentedControl.Root>
          <Text size="1" color="gray">
            {WEIGHTING_HELP[inputs.weighting]}
          </Text>
        </Flex>
        <Table.Root variant="surface" size="1">
          <caption className="visually-hidden">Sources and combined values</caption>
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell>Well</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Interpretation</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell className="summary-table__num">Net pay ({lengthUnit})</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell className="summary-table__num">Porosity</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell className="summary-table__num">Sw</Table.ColumnHeaderCell>
              {inputs.weighting === 'area' ? <Table.ColumnHeaderCell className="summary-table__num">Drainage area ({areaUnit})</Table.ColumnHeaderCell> : null}
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {c.sources.map((s) => {
              const w = wells.get(s.wellId);
              const fromSource = s.netPayFt === null ? null : lengthUnit === 'ft' ? s.netPayFt : s.netPayFt * 0.3048;
              return (
                <Table.Row key={s.wellId}>
                  <Table.RowHeaderCell>
                    {s.wellName}
                    {w && !w.used ? (
                      <Badge ml="2" color="gray" variant="soft" title="A value is missing (e.g. no net pay, so no mean porosity): the well is skipped in the averages">
                        skipped
                      </Badge>
                    ) : null}
                  </Table.RowHeaderCell>
                  <Table.Cell>
                    v{s.version}
                    {s.thicknessBasis ? <Text color="gray"> · {s.thicknessBasis}</Text> : null}
                    {s.stale ? (
                      <Badge ml="2" color="orange" variant="soft">
                        stale: v{s.latestApprovedVersion} approved
                      </Badge>
                    ) : null}
                  </Table.Cell>
                  <Table.Cell>{valueCell(s.wellId, 'netPay', fmtPay(w?.netPay ?? fromSource), fromSource === null ? null : Number(fromSource.toPrecision(6)))}</Table.Cell>
                  <Table.Cell>{valueCell(s.wellId, 'porosity', formatFraction(w?.porosity ?? s.porosity), s.porosity)}</Table.Cell>
                  <Table.Cell>{valueCell(s.wellId, 'sw', formatFraction(w?.sw ?? s.sw), s.sw)}</Table.Cell>
                  {inputs.weighting === 'area' ? (
                    <Table.Cell className="summary-table__num">
                      <input
                        className="number-input"
                        aria-label={`Drainage area of ${s.wellName} (${areaUnit})`}
                        defaultValue={inputs.drainageAreas[s.wellId] ?? ''}
                        inputMode="decimal"
                        disabled={!editable}
                        onBlur={(e) => setArea(s.wellId, e.currentTarget.value)}
                      />
                    </Table.Cell>
                  ) : null}
                </Table.Row>
              );
            })}
            {combined ? (
              <Table.Row className="rc-combined-row">
                <Table.RowHeaderCell>
                  <strong>Combined</strong>
                </Table.RowHeaderCell>
                <Table.Cell>
                  <Text size="1" color="gray">
                    {combined.computed.wellsUsed} well(s){combined.computed.wellsSkipped ? `, ${combined.computed.wellsSkipped} skipped` : ''}
                  </Text>
                </Table.Cell>
                {(['netPay', 'porosity', 'sw'] as const).map((k) => (
                  <Table.Cell key={k}>
                    <Flex gap="2" align="center" justify="end">
                      <span className={combined.overridden.includes(k) ? 'rc-overridden' : undefined} title={`Computed ${k === 'netPay' ? fmtPay(combined.computed.netPay) : formatFraction(combined.computed[k])}; ${combined.notes[k]}`}>
                        <strong>{k === 'netPay' ? fmtPay(combined.final.netPay) : formatFraction(combined.final[k])}</strong>
                      </span>
                      {editable ? (
                        <OverrideDialog
                          subject={`the combined ${k === 'netPay' ? 'net pay' : k === 'porosity' ? 'porosity' : 'Sw'}`}
                          unit={k === 'netPay' ? lengthUnit : 'v/v'}
                          computed={Number(combined.computed[k].toPrecision(6))}
                          current={inputs.overrides[k]}
                          fraction={k !== 'netPay'}
                          onSave={(value, reason) => patchCaseOverride(k, { value, reason })}
                          onRemove={() => patchCaseOverride(k, undefined)}
                          disabled={update.isPending}
                        />
                      ) : null}
                    </Flex>
                  </Table.Cell>
                ))}
                {inputs.weighting === 'area' ? (
                  <Table.Cell className="summary-table__num">
                    {combined.computed.totalDrainageArea === null ? '–' : `${formatSig(combined.computed.totalDrainageArea)} total`}
                  </Table.Cell>
                ) : null}
              </Table.Row>
            ) : null}
          </Table.Body>
        </Table.Root>
        {combined ? (
          <Text size="1" color="gray">
            Net pay: {combined.notes.netPay}; porosity: {combined.notes.porosity}; Sw: {combined.notes.sw}. Net pay is the true vertical thickness (TVT) when the interpretation had a survey, else TVD or MD as marked.
          </Text>
        ) : (
          <Callout.Root color="orange" size="1" role="status">
            <Callout.Text>{c.combinedError}</Callout.Text>
          </Callout.Root>
        )}
        <OverrideList reservesCase={c} />
        {update.error || refresh.error ? (
          <Callout.Root color="tomato" size="1" role="alert">
            <Callout.Text>{(update.error ?? refresh.error)!.message}</Callout.Text>
          </Callout.Root>
        ) : null}
      </section>
    </Flex>
  );
}

/** Every override with its reason, author and time (the record the reviewer reads). */
function OverrideList({ reservesCase: c }: { reservesCase: ReservesCase }) {
  const rows: { what: string; o: Override }[] = [];
  const name = (k: string) => (k === 'netPay' ? 'net pay' : k === 'porosity' ? 'porosity' : 'Sw');
  for (const [k, o] of Object.entries(c.inputs.overrides)) if (o) rows.push({ what: `Combined ${name(k)}`, o });
  for (const [wellId, values] of Object.entries(c.inputs.wellOverrides)) {
    const well = c.sources.find((s) => s.wellId === wellId)?.wellName ?? 'a removed well';
    for (const [k, o] of Object.entries(values)) if (o) rows.push({ what: `${name(k)} of ${well}`, o });
  }
  if (!rows.length) return null;
  return (
    <Flex direction="column" gap="1">
      <Text size="2" weight="medium">
        Overrides
      </Text>
      <ul className="rc-overrides">
        {rows.map((r) => (
          <li key={r.what}>
            <Text size="2">
              <strong>{r.what}</strong> = {r.o.value} — “{r.o.reason}” ({r.o.byName ?? 'unknown'}, {new Date(r.o.at).toLocaleDateString('en')})
            </Text>
          </li>
        ))}
      </ul>
    </Flex>
  );
}
