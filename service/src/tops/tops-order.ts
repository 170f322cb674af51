/** A formation top as the order check needs it. */
export interface TopPick {
  formationId: string;
  md: number;
}

export interface OrderedFormation {
  id: string;
  name: string;
  ordinal: number;
}

/**
 * Tops must deepen in stratigraphic order: sorted by formation ordinal, each top's MD is
 * strictly greater than the one above (a formation absent from a well simply has no top).
 * Returns a message naming both formations for the first violation, or null when in order.
 *
 * @example topsOrderProblem([{ formationId: 'a', md: 1200 }, { formationId: 'b', md: 1100 }], [{ id: 'a', name: 'A', ordinal: 1 }, { id: 'b', name: 'B', ordinal: 2 }])
 *   // 'the top of "B" (1100) must be deeper than the top of "A" (1200)'
 */
export function topsOrderProblem(tops: readonly TopPick[], formations: readonly OrderedFormation[]): string | null {
  const byId = new Map(formations.map((f) => [f.id, f]));
  const sorted = tops
    .filter((t) => byId.has(t.formationId))
    .map((t) => ({ ...t, f: byId.get(t.formationId)! }))
    .sort((a, b) => a.f.ordinal - b.f.ordinal);
  for (let i = 1; i < sorted.length; i++) {
    const above = sorted[i - 1];
    const below = sorted[i];
    if (!(below.md > above.md)) {
      return `the top of "${below.f.name}" (${below.md}) must be deeper than the top of "${above.f.name}" (${above.md})`;
    }
  }
  return null;
}
