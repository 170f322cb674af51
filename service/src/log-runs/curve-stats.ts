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

/** Little-endian float64 bytes of a sample array (the storage form of `curves.samples`). */
export function toFloat64Bytes(values: Float64Array): Uint8Array {
  const copy = Float64Array.from(values);
  const bytes = new Uint8Array(copy.buffer);
  if (new Uint8Array(new Uint16Array([1]).buffer)[0] !== 1) for (let i = 0; i < bytes.length; i += 8) bytes.subarray(i, i + 8).reverse();
  return bytes;
}

/** Inverse of {@link toFloat64Bytes}. */
export function fromFloat64Bytes(bytes: Uint8Array): Float64Array {
  const copy = bytes.slice();
  if (new Uint8Array(new Uint16Array([1]).buffer)[0] !== 1) for (let i = 0; i < copy.length; i += 8) copy.subarray(i, i + 8).reverse();
  return new Float64Array(copy.buffer, 0, copy.length / 8);
}
