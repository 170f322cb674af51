import { Text } from '@radix-ui/themes';
import { knownCurves } from '../utils/track-layout';
import type { DepthViewZone } from './workbench-depth-view';

export interface DepthReadoutProps {
  index: number | null;
  depth: Float64Array;
  depthUnit: string;
  curves: Readonly<Record<string, ArrayLike<number>>>;
  zones: readonly DepthViewZone[];
}

const FLAG_KEYS = new Set(['NET_RES', 'NET_PAY']);

function formatReading(key: string, v: number | undefined): string {
  if (v === undefined || !Number.isFinite(v)) return '–';
  if (FLAG_KEYS.has(key)) return v === 1 ? 'yes' : 'no';
  const a = Math.abs(v);
  if (a !== 0 && (a < 0.01 || a >= 10000)) return v.toExponential(2);
  return String(Number(v.toPrecision(4)));
}

/** The value of every curve at the depth under the cursor, with the zone it falls in. */
export function DepthReadout({ index, depth, depthUnit, curves, zones }: DepthReadoutProps) {
  const known = knownCurves();
  const knownKeys = new Set(known.map((c) => c.key));
  const rows = [
    ...known.filter((c) => curves[c.key]).map((c) => ({ key: c.key, label: c.label, unit: c.unit })),
    ...Object.keys(curves)
      .filter((k) => !knownKeys.has(k))
      .map((k) => ({ key: k, label: k, unit: '' })),
  ];
  const at = index !== null && index >= 0 && index < depth.length ? index : null;
  const d = at === null ? null : depth[at];
  const zone = d === null ? null : zones.find((z) => d >= z.top && d < z.base);

  return (
    <section aria-label="Cursor readout" className="wb-readout">
      <Text as="p" size="1" color="gray" className="wb-readout__hint">
        {at === null ? 'Move the pointer over the depth view to read every curve.' : null}
      </Text>
      <dl className="wb-readout__list">
        <div className="wb-readout__row wb-readout__row--depth">
          <dt>MD</dt>
          <dd>{d === null ? '–' : `${formatReading('MD', d)} ${depthUnit}`}</dd>
        </div>
        <div className="wb-readout__row">
          <dt>Zone</dt>
          <dd>{zone ? zone.name : '–'}</dd>
        </div>
        {rows.map((r) => (
          <div key={r.key} className="wb-readout__row" data-readout={r.key}>
            <dt>{r.label}</dt>
            <dd>
              {at === null ? '–' : formatReading(r.key, curves[r.key][at])}
              {at !== null && r.unit && Number.isFinite(curves[r.key][at]) ? <span className="wb-readout__unit"> {r.unit}</span> : null}
            </dd>
          </div>
        ))}
      </dl>
    </section>
  );
}
