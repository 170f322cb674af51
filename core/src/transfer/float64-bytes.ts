/**
 * Float64 samples <-> little-endian bytes: the storage form of a curve's samples (one bytea
 * per curve) and the data part of a curve bundle. NaN (missing) survives the round trip.
 * On a big-endian host the bytes are swapped so the stored form is the same everywhere.
 */

/** True on a little-endian host (every current browser and Node platform). */
export function littleEndianHost(): boolean {
  return new Uint8Array(new Uint16Array([1]).buffer)[0] === 1;
}

/** Reverses each 8-byte group in place (little <-> big endian float64). */
export function swapFloat64(bytes: Uint8Array): void {
  for (let i = 0; i + 8 <= bytes.length; i += 8) bytes.subarray(i, i + 8).reverse();
}

/** Little-endian float64 bytes of a sample array (a new buffer; the input is not changed). */
export function float64ToBytes(values: Float64Array): Uint8Array {
  const bytes = new Uint8Array(Float64Array.from(values).buffer);
  if (!littleEndianHost()) swapFloat64(bytes);
  return bytes;
}

/**
 * Inverse of {@link float64ToBytes} (copies, so the result is aligned and owned).
 * @throws RangeError when the byte count is not a multiple of 8
 */
export function bytesToFloat64(bytes: Uint8Array): Float64Array {
  if (bytes.length % 8 !== 0) throw new RangeError(`bytesToFloat64: ${bytes.length} bytes is not a whole number of float64 values`);
  const copy = bytes.slice();
  if (!littleEndianHost()) swapFloat64(copy);
  return new Float64Array(copy.buffer, 0, copy.length / 8);
}
