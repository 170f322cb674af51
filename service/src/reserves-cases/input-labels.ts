import type { InputName } from './case-inputs.js';

/** How the case inputs are named in the export and in the stated conventions. */
export const INPUT_LABELS: Record<InputName, string> = {
  area: 'Area',
  netPay: 'Net pay',
  porosity: 'Porosity (fraction)',
  sw: 'Sw (fraction)',
  bo: 'Formation volume factor (Bo or Bg)',
  recoveryFactor: 'Recovery factor (fraction)',
};
