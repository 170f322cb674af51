import type { DefaultLithology } from '@poreline/core';

/**
 * Lithologies a formation can be declared as; each gives its zones their default evaluation
 * parameters through core's `defaultZoneParameters` (matrix constants, Sw model).
 */
export const LITHOLOGIES = ['sandstone', 'shaly_sand', 'limestone', 'dolomite'] as const satisfies readonly DefaultLithology[];
export type FormationLithology = (typeof LITHOLOGIES)[number];
