/** A zone of the well with its parameters, as the workbench lists it. */
export interface ZoneWithParams<P> {
  formationId: string;
  name: string;
  colour: string;
  top: number;
  base: number | null;
  params: P;
  isDefault: boolean;
}

/** A zone ready for core's evaluateWell (name and formation are the formation's name). */
export interface EvaluationZoneSpec<P> {
  formationId: string;
  name: string;
  formation: string;
  colour: string;
  top: number;
  base: number;
  params: P;
  isDefault: boolean;
}

/**
 * The zones the evaluation runs on: each zone clipped to the merged depth index [first, last];
 * zones without a base or entirely outside the logged interval are left out, with a note
 * saying why. The browser and the server evaluate exactly these zones.
 *
 * @example evaluationZones([{ name: 'A', top: 90, base: 150, ... }], { first: 100, last: 200 }).zones[0].top // 100 (note: clipped)
 */
export function evaluationZones<P>(zones: readonly ZoneWithParams<P>[], logged: { first: number; last: number } | null): { zones: EvaluationZoneSpec<P>[]; notes: string[] } {
  const out: EvaluationZoneSpec<P>[] = [];
  const notes: string[] = [];
  for (const z of zones) {
    if (!logged) {
      notes.push(`Zone '${z.name}' is not evaluated: the well has no merged log data.`);
      continue;
    }
    if (z.base === null) {
      notes.push(`Zone '${z.name}' is not evaluated: nothing is logged below its top (${z.top}).`);
      continue;
    }
    const top = Math.max(z.top, logged.first);
    const base = Math.min(z.base, logged.last);
    if (!(top < base)) {
      notes.push(`Zone '${z.name}' (${z.top} - ${z.base}) is not evaluated: it lies outside the logged interval ${logged.first} - ${logged.last}.`);
      continue;
    }
    if (top !== z.top || base !== z.base) notes.push(`Zone '${z.name}' is evaluated over ${top} - ${base}, the part of ${z.top} - ${z.base} inside the logged interval.`);
    out.push({ formationId: z.formationId, name: z.name, formation: z.name, colour: z.colour, top, base, params: z.params, isDefault: z.isDefault });
  }
  return { zones: out, notes };
}
