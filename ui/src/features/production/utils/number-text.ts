import { z } from 'zod';

/** A typed number that must be given and be > 0 (messages name the field by its label). */
export const positiveText = (label: string) =>
  z
    .string()
    .trim()
    .min(1, { error: `${label} is required.` })
    .refine((s) => Number(s) > 0, { error: `${label} must be a number > 0.` });

/** A typed number that may be left empty; when given it must be >= `min`. */
export const optionalNumberText = (label: string, min = -Infinity) =>
  z
    .string()
    .trim()
    .refine((s) => s === '' || (Number.isFinite(Number(s)) && Number(s) >= min), { error: `${label} must be a number${min > -Infinity ? ` >= ${min}` : ''} or empty.` });
