import type { ZoneSummary } from '@poreline/core';
import { Badge, Button, Callout, Card, Flex, Heading, Spinner, Tabs, Text } from '@radix-ui/themes';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { PanelErrorBoundary } from '../../../components/panel-error-boundary';
import { exportPng, exportSvg, fileStem } from '../../../lib/svg-export';
import type { Cutoffs, FormationDto, InterpretationDto } from '../../../types/workbench';
import { usePutBindings, useBindings } from '../api/bindings';
import { useCurveCheck } from '../api/curve-check';
import { mergedSamplesQueryOptions, useMergedSamples } from '../api/get-merged-samples';
import { useWorkbench } from '../api/get-workbench';
import { useSaveInterpretation } from '../api/save-interpretation';
import { useSurvey, useUploadSurvey } from '../api/survey';
import { usePutTops, useTops } from '../api/tops';
import { useDraftCutoffs } from '../hooks/use-draft-cutoffs';
import { defaultFormation, useLiveEvaluation, useSensitivity } from '../hooks/use-live-evaluation';
import { useTopsDraft } from '../hooks/use-tops-draft';
import { compareSummaries, type SummaryMismatch } from '../utils/live-evaluation';
import { ConventionsList } from './conventions-list';
import { NeutronDensityPlot, PhiVshPlot, PickettPlot, zoneSampleIndices } from './crossplots';
import { CurveCheckPanel } from './curve-check-panel';
import { CutoffSliders } from './cutoff-sliders';
import { DepthReadout } from './depth-readout';
import { KeyFigures } from './key-figures';
import { LiveZoneTable } from './live-zone-table';
import { SensitivityPlots } from './sensitivity-plots';
import { SurveyUpload } from './survey-upload';
import { TopsEditor } from './tops-editor';
import { WorkbenchDepthView, type DepthViewZone } from './workbench-depth-view';
import { ZoneParamsPanel } from './zone-params-panel';
import { zoneRw } from '../utils/zone-rw';

export interface WorkbenchScreenProps {
  assetId: string;
  wellId: string;
  wellName: string;
  canEdit: boolean;
  formations: readonly FormationDto[];
  /** Log run file names by id. */
  runNames: Readonly<Record<string, string>>;
  /** Status badge and file exports of the latest version (from the review and zone-table features). */
  renderLatest?: (latest: InterpretationDto | null) => ReactNode;
  /** The versions and review panel. */
  versionsPanel?: ReactNode;
}

const RAW_KEYS = ['GR', 'SP', 'CALI', 'RT', 'RM', 'RXO', 'RHOB', 'NPHI', 'DT', 'PE'];

/**
 * The well workbench: the depth view with its cursor readout, and beside it the tuning panel
 * (cutoff sliders of the selected formation with live figures), tops, zone parameters, curve
 * check and versions; under it the live zone summary, crossplots and sensitivity plots.
 * Everything recomputes in the browser from samples fetched once; "Save" stores the version
 * and checks that the server's summary equals the browser's.
 */
export function WorkbenchScreen({ assetId, wellId, wellName, canEdit, formations, runNames, renderLatest, versionsPanel }: WorkbenchScreenProps) {
  const workbench = useWorkbench(assetId, wellId);
  const samples = useMergedSamples(assetId, wellId);
  const wb = workbench.data;
  const depthUnit = wb?.depthUnit ?? samples.data?.depthUnit ?? '';

  // The samples are kept for the session; if the server's merged index no longer matches them
  // (a LAS file loaded elsewhere since), fetch them again.
  const queryClient = useQueryClient();
  const stale =
    !!wb?.merged && !!samples.data && (wb.merged.samples !== samples.data.depth.length || Math.abs(wb.merged.start - samples.data.depth[0]) > 1e-9);
  useEffect(() => {
    if (stale) void queryClient.invalidateQueries({ queryKey: mergedSamplesQueryOptions(assetId, wellId).queryKey });
  }, [stale, queryClient, assetId, wellId]);

  const cut = useDraftCutoffs(wb?.cutoffs);
  const zoneNames = useMemo(() => (wb ? [...new Set(wb.zones.map((z) => z.name))] : []), [wb]);
  const [chosen, setChosen] = useState<string | null>(null);
  const live = useLiveEvaluation(samples.data, wb, cut.draft);
  const selected = chosen && zoneNames.includes(chosen) ? chosen : defaultFormation(live.base, zoneNames);
  const sensitivity = useSensitivity(live, selected);

  const tops = useTops(assetId, wellId);
  const putTops = usePutTops(assetId, wellId);
  const formationRefs = useMemo(() => formations.map((f) => ({ id: f.id, name: f.name, ordinal: f.ordinal, colour: f.colour })), [formations]);
  const topsDraft = useTopsDraft(tops.data, formationRefs);

  const save = useSaveInterpretation(assetId, wellId);
  const [check, setCheck] = useState<{ mismatches: SummaryMismatch[]; version: number; zones: number } | null>(null);
  const [tab, setTab] = useState('tune');
  const svgRef = useRef<SVGSVGElement>(null);
  const [cursor, setCursor] = useState<number | null>(null);

  const zones: DepthViewZone[] = useMemo(
    () => (wb ? wb.zones.map((z) => ({ name: z.name, formation: z.formation ?? z.name, colour: z.colour, top: z.top, base: z.base })) : []),
    [wb],
  );
  const colours = useMemo(() => Object.fromEntries(zones.map((z) => [z.formation, z.colour])), [zones]);

  // Raw curves + computed curves (recomputed with parameters) + flags (recomputed with cutoffs).
  const baseCurves = useMemo(() => {
    const out: Record<string, ArrayLike<number>> = {};
    const s = samples.data;
    if (s) for (const k of RAW_KEYS) if (s.curves[k]) out[k] = s.curves[k].values;
    const c = live.base?.result.curves;
    if (c) Object.assign(out, { VSH: c.VSH, PHIT: c.PHIT, PHIE: c.PHIE, SW: c.SW, BVW: c.BVW });
    return out;
  }, [samples.data, live.base]);
  const curves = useMemo(
    () => (live.live ? { ...baseCurves, NET_RES: live.live.NET_RES, NET_PAY: live.live.NET_PAY } : baseCurves),
    [baseCurves, live.live],
  );

  const selectedIdx = useMemo(
    () => (wb && samples.data ? zoneSampleIndices(samples.data.depth, wb.zones.filter((z) => z.name === selected)) : []),
    [wb, samples.data, selected],
  );

  const summaries: ZoneSummary[] = live.live?.summaries ?? [];
  const latest = wb?.latest ?? null;
  const locked = latest?.status === 'submitted';

  const onSave = () => {
    if (!wb) return;
    const browser = summaries;
    const changed = cut.changed.map((name) => {
      const formationId = wb.zones.find((z) => z.name === name)?.formationId ?? formations.find((f) => f.name === name)?.id ?? '';
      return { formationId, cutoffs: cut.draft[name] };
    });
    setCheck(null);
    save.mutate(
      { cutoffs: changed },
      {
        onSuccess: (saved) =>
          setCheck({ mismatches: compareSummaries(browser, saved.summaries), version: saved.version, zones: browser.length }),
      },
    );
  };

  if (workbench.isPending || samples.isPending) {
    return (
      <Flex gap="2" align="center" py="8" justify="center" role="status">
        <Spinner /> <Text color="gray">Loading the well’s curves…</Text>
      </Flex>
    );
  }
  if (workbench.isError || samples.isError) {
    const e = workbench.error ?? samples.error;
    return (
      <Callout.Root color="tomato" role="alert">
        <Callout.Text>The workbench could not be loaded: {e?.message}</Callout.Text>
      </Callout.Root>
    );
  }
  const s = samples.data!;
  const w = wb!;
  const selectedZones = w.zones.filter((z) => z.name === selected);
  const selParams = (selectedZones[0]?.params ?? {}) as Record<string, unknown>;
  const selCutoffs = selected ? live.appliedCutoffs[selected] : undefined;
  const draftSel = selected ? cut.draft[selected] : undefined;
  const resolved = live.base?.result.resolved.find((r) => r.zone === selected);
  const rwAtZone = selectedZones[0] && resolved ? zoneRw(selectedZones[0], resolved, w.survey) : null;

  return (
    <Flex direction="column" gap="4" className="wb-page">
      <Flex justify="between" align="center" gap="3" wrap="wrap">
        <Flex align="center" gap="3" wrap="wrap">
          {renderLatest?.(latest)}
          {cut.changed.length ? (
            <Badge color="amber" variant="soft">
              unsaved cutoffs: {cut.changed.join(', ')}
            </Badge>
          ) : null}
        </Flex>
        <Flex gap="2" wrap="wrap" align="center">
          {canEdit ? (
            <Button onClick={onSave} loading={save.isPending} disabled={locked || !!live.error} title={locked ? 'The latest version waits for review' : undefined}>
              Save
            </Button>
          ) : null}
          <Button variant="soft" color="gray" onClick={() => svgRef.current && exportSvg(svgRef.current, `${fileStem(wellName)}-depth-view.svg`)}>
            Export SVG
          </Button>
          <Button variant="soft" color="gray" onClick={() => svgRef.current && void exportPng(svgRef.current, `${fileStem(wellName)}-depth-view.png`)}>
            Export PNG
          </Button>
        </Flex>
      </Flex>
      {locked ? (
        <Callout.Root color="amber">
          <Callout.Text>Version {latest?.version} waits for review: saving is locked until it is approved or returned.</Callout.Text>
        </Callout.Root>
      ) : null}
      {save.isError ? (
        <Callout.Root color="tomato" role="alert">
          <Callout.Text>Saving failed: {save.error.message}</Callout.Text>
        </Callout.Root>
      ) : null}
      {check ? <ServerCheck {...check} /> : null}
      {live.error ? (
        <Callout.Root color="amber" role="alert">
          <Callout.Text>Not evaluable yet: {live.error}</Callout.Text>
        </Callout.Root>
      ) : null}

      {w.notes?.length ? (
        <Callout.Root color="gray" size="1">
          {w.notes.map((n) => (
            <Callout.Text key={n}>{n}</Callout.Text>
          ))}
        </Callout.Root>
      ) : null}

      <div className="wb-grid">
        <div className="wb-grid__view">
          <PanelErrorBoundary title="The depth view">
            <div className="depth-view-scroller wb-scroller">
              <WorkbenchDepthView
                svgRef={svgRef}
                wellName={wellName}
                depthUnit={depthUnit}
                depth={s.depth}
                curves={curves}
                zones={zones}
                cutoffs={live.appliedCutoffs}
                selectedFormation={selected}
                onPickDepth={topsDraft.picking ? topsDraft.applyPick : undefined}
                onCursor={setCursor}
              />
            </div>
          </PanelErrorBoundary>
        </div>
        <Card className="wb-grid__side" size="2">
          <Tabs.Root value={tab} onValueChange={setTab}>
            <Tabs.List size="1">
              <Tabs.Trigger value="tune">Tune</Tabs.Trigger>
              <Tabs.Trigger value="tops">Tops</Tabs.Trigger>
              <Tabs.Trigger value="params">Parameters</Tabs.Trigger>
              <Tabs.Trigger value="curves">Curves</Tabs.Trigger>
              <Tabs.Trigger value="versions">Versions</Tabs.Trigger>
            </Tabs.List>
            <div className="wb-tab">
              <Tabs.Content value="tune">
                <Flex direction="column" gap="3">
                  {zoneNames.length ? (
                    <Flex gap="2" align="center">
                      <label htmlFor="tune-formation" className="zp-inline-label">
                        Formation
                      </label>
                      <select id="tune-formation" className="native-select" value={selected ?? ''} onChange={(e) => setChosen(e.currentTarget.value)}>
                        {zoneNames.map((n) => (
                          <option key={n} value={n}>
                            {n}
                          </option>
                        ))}
                      </select>
                    </Flex>
                  ) : (
                    <Text color="gray">No zones yet: add formation tops in the Tops tab.</Text>
                  )}
                  {selected && draftSel ? (
                    <>
                      <KeyFigures formation={selected} summaries={summaries} depthUnit={depthUnit} />
                      <CutoffSliders
                        formation={selected}
                        cutoffs={draftSel}
                        stored={w.cutoffs[selected]}
                        onChange={(field, value) => {
                          setChosen(selected);
                          cut.set(selected, field as keyof Cutoffs, value);
                        }}
                      />
                      {cut.changed.length ? (
                        <Flex gap="2" align="center" wrap="wrap">
                          <Text size="1" color="gray">
                            {canEdit && !locked
                              ? `Cutoffs apply to ${selected} in every well of the asset; “Save” stores them and this version.`
                              : 'A what-if in this browser only: nothing is stored.'}
                          </Text>
                          <Button size="1" variant="ghost" color="gray" onClick={cut.reset}>
                            Back to the stored cutoffs
                          </Button>
                        </Flex>
                      ) : null}
                    </>
                  ) : null}
                  <DepthReadout index={cursor} depth={s.depth} depthUnit={depthUnit} curves={curves} zones={zones} />
                </Flex>
              </Tabs.Content>
              <Tabs.Content value="tops">
                <TopsEditor
                  draft={topsDraft}
                  formations={formationRefs}
                  depthUnit={depthUnit}
                  canEdit={canEdit}
                  saving={putTops.isPending}
                  error={putTops.isError ? putTops.error.message : null}
                  onSave={() => putTops.mutate(topsDraft.payload)}
                />
              </Tabs.Content>
              <Tabs.Content value="params">
                <ZoneParamsPanel assetId={assetId} wellId={wellId} depthUnit={depthUnit} zones={w.zones} canEdit={canEdit && !locked} formations={formations} />
              </Tabs.Content>
              <Tabs.Content value="curves">
                <CurvesTab assetId={assetId} wellId={wellId} depthUnit={depthUnit} runNames={runNames} canEdit={canEdit} />
              </Tabs.Content>
              <Tabs.Content value="versions">{versionsPanel}</Tabs.Content>
            </div>
          </Tabs.Root>
        </Card>
      </div>

      <section aria-labelledby="zone-summary-heading">
        <Heading as="h2" size="4" id="zone-summary-heading" mb="2">
          Zone summary <Text size="2" color="gray" weight="regular">(live, recomputed in the browser)</Text>
        </Heading>
        <LiveZoneTable summaries={summaries} depthUnit={depthUnit} colours={colours} hasSurvey={!!w.survey} />
        {live.base?.result.warnings.length ? (
          <details className="conventions" style={{ marginTop: 8 }}>
            <summary>
              <Text size="2" weight="medium">
                Evaluation warnings ({live.base.result.warnings.length})
              </Text>
            </summary>
            <ul className="plain-list" aria-label="Evaluation warnings">
              {live.base.result.warnings.map((wn, i) => (
                <li key={i}>
                  <Text size="2">
                    {wn.zone ? <strong>{wn.zone}: </strong> : null}
                    {wn.message}
                  </Text>
                </li>
              ))}
            </ul>
          </details>
        ) : null}
      </section>

      {selected && selCutoffs && live.base ? (
        <section aria-labelledby="plots-heading">
          <Heading as="h2" size="4" id="plots-heading" mb="2">
            {selected}: crossplots and sensitivity
          </Heading>
          <div className="wb-plots">
            <NeutronDensityPlot
              nphi={s.curves.NPHI?.values}
              rhob={s.curves.RHOB?.values}
              indices={selectedIdx}
              colour={colours[selected] ?? '#777'}
              rhoMatrix={num(selParams.rhoMatrix)}
              rhoFluid={num(selParams.rhoFluid)}
            />
            <PickettPlot
              phie={live.base.result.curves.PHIE}
              rt={s.curves.RT?.values}
              sw={live.base.result.curves.SW}
              indices={selectedIdx}
              a={num(selParams.a) ?? 1}
              m={resolved?.m ?? num(selParams.m) ?? 2}
              n={num(selParams.n) ?? 2}
              rw={rwAtZone}
              swMax={selCutoffs.swMax}
            />
            <PhiVshPlot phie={live.base.result.curves.PHIE} vsh={live.base.result.curves.VSH} sw={live.base.result.curves.SW} indices={selectedIdx} cutoffs={selCutoffs} />
          </div>
          {sensitivity ? <SensitivityPlots sensitivity={sensitivity} cutoffs={selCutoffs} depthUnit={depthUnit} /> : null}
        </section>
      ) : null}

      <ConventionsList />
    </Flex>
  );
}

function num(v: unknown): number | undefined {
  return typeof v === 'number' && Number.isFinite(v) ? v : undefined;
}

function ServerCheck({ mismatches, version, zones }: { mismatches: SummaryMismatch[]; version: number; zones: number }) {
  if (!mismatches.length) {
    return (
      <Callout.Root color="jade" role="status" data-server-check="match">
        <Callout.Text>
          Saved as version {version}. The server recomputed it with the same core code: its summary equals the browser’s for all {zones} zone
          {zones === 1 ? '' : 's'}.
        </Callout.Text>
      </Callout.Root>
    );
  }
  return (
    <Callout.Root color="tomato" role="alert" data-server-check="mismatch">
      <Callout.Text>
        Saved as version {version}, but the server’s summary differs from the browser’s:{' '}
        {mismatches
          .slice(0, 6)
          .map((m) => `${m.zone} ${m.field} (browser ${m.browser ?? '–'}, server ${m.server ?? '–'})`)
          .join('; ')}
        .
      </Callout.Text>
    </Callout.Root>
  );
}

function CurvesTab({ assetId, wellId, depthUnit, runNames, canEdit }: { assetId: string; wellId: string; depthUnit: string; runNames: Readonly<Record<string, string>>; canEdit: boolean }) {
  const check = useCurveCheck(assetId, wellId);
  const bindings = useBindings(assetId, wellId);
  const putBindings = usePutBindings(assetId, wellId);
  const survey = useSurvey(assetId, wellId);
  const upload = useUploadSurvey(assetId, wellId);
  return (
    <Flex direction="column" gap="4">
      {check.isPending || bindings.isPending ? (
        <Text color="gray">Checking curves…</Text>
      ) : check.isError || bindings.isError ? (
        <Callout.Root color="tomato" role="alert">
          <Callout.Text>{(check.error ?? bindings.error)?.message}</Callout.Text>
        </Callout.Root>
      ) : (
        <CurveCheckPanel
          depthUnit={depthUnit}
          rows={check.data}
          bindings={bindings.data}
          runNames={runNames}
          canEdit={canEdit}
          saving={putBindings.isPending}
          error={putBindings.isError ? putBindings.error.message : null}
          onConfirm={(b) => putBindings.mutate(b)}
        />
      )}
      <SurveyUpload
        survey={survey.data}
        canEdit={canEdit}
        uploading={upload.isPending}
        error={upload.isError ? upload.error.message : null}
        onFile={(file, depthUnit) => upload.mutate({ file, depthUnit })}
      />
    </Flex>
  );
}
