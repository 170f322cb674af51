/**
 * Bytes <-> text for the LAS reader, without Node APIs: UTF-8 through the platform's
 * TextDecoder/TextEncoder (present in browsers and Node), Latin-1 by code point.
 */

interface Decoder {
  decode(bytes: Uint8Array): string;
}
interface Encoder {
  encode(text: string): Uint8Array;
}
interface Codecs {
  TextDecoder: new (label: string, options?: { fatal?: boolean }) => Decoder;
  TextEncoder: new () => Encoder;
}

const codecs = globalThis as unknown as Codecs;
let strictUtf8: Decoder | undefined;
let encoder: Encoder | undefined;

/** Decodes strict UTF-8; returns null when the bytes are not valid UTF-8. */
export function decodeUtf8Strict(bytes: Uint8Array): string | null {
  strictUtf8 ??= new codecs.TextDecoder('utf-8', { fatal: true });
  try {
    return strictUtf8.decode(bytes);
  } catch {
    return null;
  }
}

/** Decodes bytes as ISO-8859-1 (each byte is one code point). */
export function decodeLatin1(bytes: Uint8Array): string {
  let out = '';
  const chunk = 8192;
  for (let i = 0; i < bytes.length; i += chunk) {
    out += String.fromCharCode.apply(null, bytes.subarray(i, i + chunk) as unknown as number[]);
  }
  return out;
}

/** Encodes a string as UTF-8 bytes. */
export function encodeUtf8(text: string): Uint8Array {
  encoder ??= new codecs.TextEncoder();
  return encoder.encode(text);
}

/** Splits text into lines at CRLF, CR or LF (the same rule as the byte scanner). */
export function splitLines(text: string): string[] {
  return text.split(/\r\n|\r|\n/);
}
