import { decodeUtf8Strict, encodeUtf8 } from '../las/text.js';
import { littleEndianHost, swapFloat64 } from './float64-bytes.js';

/**
 * Curve bundle: a compact binary frame that carries several sample arrays (one per curve)
 * with their names and units, so the browser receives a log run's samples in one response
 * and keeps them as typed arrays (no JSON number parsing, no per-sample rows).
 *
 * Layout (all little-endian):
 *   bytes 0..3   ASCII magic "PLCB"
 *   bytes 4..7   uint32 length L of the UTF-8 JSON header
 *   bytes 8..    JSON header `{ version: 1, length: n, curves: [{ mnemonic, unit, ... }] }`
 *   then zero padding to a multiple of 8, then for each curve in header order n float64 values.
 * NaN stands for a missing sample (LAS NULL).
 */
export interface CurveBundleEntry {
  mnemonic: string;
  unit: string;
  /** Any extra JSON-safe fields (curve class, description...) travel with the curve. */
  [extra: string]: unknown;
}

export interface CurveBundle {
  entries: CurveBundleEntry[];
  values: Float64Array[];
}

const MAGIC = [0x50, 0x4c, 0x43, 0x42]; // "PLCB"

/** Encodes curves of equal length into one binary frame. Throws RangeError on unequal lengths. */
export function encodeCurveBundle(entries: readonly CurveBundleEntry[], values: readonly Float64Array[]): Uint8Array {
  if (entries.length !== values.length) {
    throw new RangeError('encodeCurveBundle: entries and values must have the same length');
  }
  const n = values.length ? values[0].length : 0;
  values.forEach((v, i) => {
    if (v.length !== n) throw new RangeError(`encodeCurveBundle: curve ${entries[i].mnemonic} has ${v.length} samples, expected ${n}`);
  });
  const header = encodeUtf8(JSON.stringify({ version: 1, length: n, curves: entries }));
  const dataStart = Math.ceil((8 + header.length) / 8) * 8;
  const out = new Uint8Array(dataStart + 8 * n * values.length);
  out.set(MAGIC, 0);
  new DataView(out.buffer).setUint32(4, header.length, true);
  out.set(header, 8);
  const data = new Float64Array(out.buffer, dataStart, n * values.length);
  values.forEach((v, i) => data.set(v, i * n));
  if (!littleEndianHost()) swapFloat64(out.subarray(dataStart));
  return out;
}

/** Decodes a frame made by {@link encodeCurveBundle}. Throws RangeError naming what is wrong. */
export function decodeCurveBundle(bytes: Uint8Array): CurveBundle {
  if (bytes.length < 8 || MAGIC.some((b, i) => bytes[i] !== b)) {
    throw new RangeError('decodeCurveBundle: not a curve bundle (bad magic)');
  }
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const headerLength = view.getUint32(4, true);
  if (8 + headerLength > bytes.length) throw new RangeError('decodeCurveBundle: truncated header');
  const text = decodeUtf8Strict(bytes.subarray(8, 8 + headerLength));
  if (text === null) throw new RangeError('decodeCurveBundle: header is not UTF-8');
  const header = JSON.parse(text) as {
    version: number;
    length: number;
    curves: CurveBundleEntry[];
  };
  if (header.version !== 1) throw new RangeError(`decodeCurveBundle: unsupported version ${header.version}`);
  const dataStart = Math.ceil((8 + headerLength) / 8) * 8;
  const n = header.length;
  const expected = dataStart + 8 * n * header.curves.length;
  if (bytes.length < expected) throw new RangeError(`decodeCurveBundle: truncated data (${bytes.length} of ${expected} bytes)`);
  const raw = bytes.slice(dataStart, expected); // copy: aligned and owned
  if (!littleEndianHost()) swapFloat64(raw);
  const all = new Float64Array(raw.buffer, 0, n * header.curves.length);
  return { entries: header.curves, values: header.curves.map((_, i) => all.slice(i * n, (i + 1) * n)) };
}
