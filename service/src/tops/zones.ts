/** A top with the formation it starts. */
export interface NamedTop {
  formationId: string;
  name: string;
  colour: string;
  md: number;
}

/** The interval between one top and the next (the zone of the upper top's formation). */
export interface ZoneSpan {
  formationId: string;
  name: string;
  colour: string;
  top: number;
  /** The next top's MD; for the deepest zone the deepest logged depth, or null when there is no log below its top. */
  base: number | null;
}

/**
 * Zones are the intervals between consecutive tops, in depth order; the last zone ends at the
 * deepest logged depth (`deepest`, null without logs). Tops are expected in depth order per
 * the formation order (see topsOrderProblem); this sorts by MD regardless.
 *
 * @example zonesFromTops([{ formationId: 'a', name: 'A', colour: '#000000', md: 100 }, { formationId: 'b', name: 'B', colour: '#ffffff', md: 150 }], 180)
 *   // [{ name: 'A', top: 100, base: 150, ... }, { name: 'B', top: 150, base: 180, ... }]
 */
export function zonesFromTops(tops: readonly NamedTop[], deepest: number | null): ZoneSpan[] {
  const sorted = [...tops].sort((a, b) => a.md - b.md);
  return sorted.map((t, i) => {
    const next = sorted[i + 1];
    const base = next ? next.md : deepest !== null && deepest > t.md ? deepest : null;
    return { formationId: t.formationId, name: t.name, colour: t.colour, top: t.md, base };
  });
}
