// Typed arrays travel as base64 of their bytes: a 160 × 120 grid is 77 kB of float32, about 100 kB as text,
// where a JSON array of the same numbers is two to three times larger and slower to parse.

export function typedToBase64(a: Float32Array | Int32Array): string {
  const bytes = new Uint8Array(a.buffer, a.byteOffset, a.byteLength);
  if (typeof Buffer !== "undefined") return Buffer.from(bytes).toString("base64");
  let s = "";
  for (let k = 0; k < bytes.length; k += 0x8000) s += String.fromCharCode(...bytes.subarray(k, k + 0x8000));
  return btoa(s);
}

function base64ToBytes(text: string): Uint8Array {
  if (typeof Buffer !== "undefined") {
    const b = Buffer.from(text, "base64");
    // Copied so the typed array starts on a 4-byte boundary.
    return new Uint8Array(b);
  }
  const s = atob(text);
  const out = new Uint8Array(s.length);
  for (let k = 0; k < s.length; k++) out[k] = s.charCodeAt(k);
  return out;
}

export function base64ToFloat32(text: string): Float32Array {
  const bytes = base64ToBytes(text);
  return new Float32Array(bytes.buffer, bytes.byteOffset, bytes.byteLength / 4);
}

export function base64ToInt32(text: string): Int32Array {
  const bytes = base64ToBytes(text);
  return new Int32Array(bytes.buffer, bytes.byteOffset, bytes.byteLength / 4);
}
