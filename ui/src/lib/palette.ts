/**
 * Poreline's own colours for charts, depth tracks and formations. These are our own picks
 * ("tideline" set): calm, mid-saturation hues that stay apart on the light sage ground of the
 * app and in print. No colour here copies any other program's colour code; a curve's colour
 * is chosen by its role in Poreline, not by an outside convention.
 */

/**
 * Formation colours, in the order new formations receive them: the same list, in the same
 * order, as the service's FORMATION_PALETTE (service/src/formations/formation-palette.ts), which
 * assigns the colour when none is chosen.
 */
export const FORMATION_PALETTE = [
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
] as const;

/** The formation colour for the n-th formation (cycles through the palette). */
export function formationColour(index: number): string {
  const n = FORMATION_PALETTE.length;
  return FORMATION_PALETTE[((index % n) + n) % n];
}

/** Curve colours by role in the depth view and plots (Poreline's own). */
export const CURVE_COLOURS = {
  gr: '#3f7d58', // pine
  sp: '#6b6f9e', // heron blue-grey
  cali: '#9a7b4f', // bark
  rt: '#8d3b50', // mulberry (deep)
  rm: '#c1713f', // rust (medium)
  rxo: '#5b8fb0', // estuary (shallow)
  rhob: '#b0493a', // brick
  nphi: '#2f6fa0', // lagoon
  dt: '#6d5b96', // iris
  pe: '#8a8a3c', // olive
  vsh: '#7a6a4f', // umber
  phit: '#7fa7c9', // pale lagoon
  phie: '#1f5f8b', // deep lagoon
  sw: '#2f7f7a', // teal
  bvw: '#9b6aa7', // plum
  netReservoir: '#d0a24b', // ochre
  netPay: '#3e8e5e', // fern
} as const;

/** Sequential ramp for Sw colouring (0 = hydrocarbon-rich, 1 = water), our own stops. */
export const SW_RAMP = ['#2e6b4f', '#6b9a5b', '#c9b25a', '#c98a4b', '#8aa9c8', '#3d6f9e'] as const;

/** Neutral greys for grids and frames (follow the Radix sage scale through CSS variables). */
export const CHART_GREYS = {
  frame: 'var(--gray-a7)',
  grid: 'var(--gray-a4)',
  text: 'var(--gray-11)',
} as const;
