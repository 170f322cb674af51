/**
 * Poreline's own formation colours, offered in this order to each new formation of an asset
 * (muted, distinguishable on a white depth view; chosen for this product, not taken from any
 * lithology colour standard). A user may pick any other `#rrggbb` colour.
 */
export const FORMATION_PALETTE: readonly string[] = [
  '#c9a227', // ochre
  '#4f9fa8', // lagoon
  '#b5654a', // rust
  '#6a7fb0', // slate blue
  '#a3b86c', // moss
  '#8c6bb1', // heather
  '#d98c5f', // apricot
  '#5b8e7d', // sage
  '#c97a9c', // rosewood
  '#7d8a4e', // olive
  '#b89f7a', // sandstone buff
  '#5d6d7e', // storm
];

/** The first palette colour no formation of the asset uses yet (cycling once all are taken). */
export function nextPaletteColour(used: readonly string[]): string {
  const taken = new Set(used.map((c) => c.toLowerCase()));
  return FORMATION_PALETTE.find((c) => !taken.has(c)) ?? FORMATION_PALETTE[used.length % FORMATION_PALETTE.length];
}
