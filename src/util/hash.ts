/**
 * FNV-1a (Fowler, Noll & Vo), 64-bit, over bytes; used for schema and data fingerprints.
 * Not cryptographic: it detects change, it does not resist tampering.
 */
export class Fnv64 {
  private hi = 0xcbf29ce4;
  private lo = 0x84222325;

  /** Mix in bytes. */
  bytes(data: Uint8Array): this {
    let hi = this.hi, lo = this.lo;
    for (let i = 0; i < data.length; i++) {
      lo = (lo ^ data[i]) >>> 0;
      // multiply (hi,lo) by the FNV prime 0x00000100_000001b3
      const l = lo * 0x1b3;
      const h = hi * 0x1b3 + (lo << 8) + Math.floor(l / 0x100000000);
      lo = l >>> 0;
      hi = h >>> 0;
    }
    this.hi = hi; this.lo = lo;
    return this;
  }

  string(s: string): this {
    return this.bytes(new TextEncoder().encode(s)).bytes(new Uint8Array([0]));
  }

  /**
   * Mix in a typed array. Whole 32-bit words go through two independent FNV-1a-32-style lanes (one with the
   * FNV-32 prime, one with an odd multiplier and a rotation), about ten times faster than byte by byte;
   * the lanes and the length are then folded into the 64-bit state byte-wise. Trailing bytes go byte-wise.
   */
  typed(a: Float64Array | Int32Array | Uint8Array | Float32Array | Uint32Array): this {
    const bytes = new Uint8Array(a.buffer, a.byteOffset, a.byteLength);
    const nWords = bytes.byteLength >>> 2;
    const words = bytes.byteOffset % 4 === 0
      ? new Uint32Array(bytes.buffer, bytes.byteOffset, nWords)
      : new Uint32Array(bytes.slice(0, nWords * 4).buffer);
    let h1 = 0x811c9dc5 | 0, h2 = 0x2545f491 | 0;
    for (let i = 0; i < nWords; i++) {
      const w = words[i];
      h1 = Math.imul(h1 ^ w, 0x01000193);
      h2 = Math.imul((h2 ^ w) << 13 | (h2 ^ w) >>> 19, 0x5bd1e995);
    }
    const tail = new Uint8Array(12);
    const dv = new DataView(tail.buffer);
    dv.setUint32(0, h1 >>> 0, true); dv.setUint32(4, h2 >>> 0, true); dv.setUint32(8, bytes.byteLength >>> 0, true);
    this.bytes(tail);
    return this.bytes(bytes.subarray(nWords * 4));
  }

  hex(): string {
    return this.hi.toString(16).padStart(8, '0') + this.lo.toString(16).padStart(8, '0');
  }
}
