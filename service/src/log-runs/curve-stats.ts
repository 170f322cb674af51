/** Count of NaN samples and the range of the others (null when every sample is null). */
export function curveStats(values: Float64Array): { nullCount: number; min: number | null; max: number | null } {
  let nullCount = 0;
  let min = Infinity;
  let max = -Infinity;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (Number.isNaN(v)) nullCount++;
    else {
      if (v < min) min = v;
      if (v > max) max = v;
    }
  }
  return nullCount === values.length ? { nullCount, min: null, max: null } : { nullCount, min, max };
}
