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

  typed(a: Float64Array | Int32Array | Uint8Array | Float32Array | Uint32Array): this {
    return this.bytes(new Uint8Array(a.buffer, a.byteOffset, a.byteLength));
  }

  hex(): string {
    return this.hi.toString(16).padStart(8, '0') + this.lo.toString(16).padStart(8, '0');
  }
}
