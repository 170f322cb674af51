import type { CurveClass } from '@poreline/core';

/**
 * The evaluation inputs a curve can be bound to, and the curve class each one takes. rt is
 * the deep resistivity, rm the medium one, rxo the shallow (flushed-zone) one.
 */
export const BINDING_CLASSES = {
  gr: 'gamma_ray',
  sp: 'spontaneous_potential',
  cali: 'caliper',
  rhob: 'bulk_density',
  nphi: 'neutron_porosity',
  dt: 'sonic',
  pe: 'photoelectric',
  rt: 'deep_resistivity',
  rm: 'medium_resistivity',
  rxo: 'shallow_resistivity',
} as const satisfies Record<string, CurveClass>;

export type BindingKey = keyof typeof BINDING_CLASSES;
export const BINDING_KEYS = Object.keys(BINDING_CLASSES) as BindingKey[];

export function isBindingKey(key: string): key is BindingKey {
  return Object.hasOwn(BINDING_CLASSES, key);
}
