/**
 * A minimal Protocol Buffers writer (encoding as specified in the Protocol Buffers documentation,
 * "Encoding": base-128 varints, wire types 0 varint, 1 64-bit, 2 length-delimited, 5 32-bit; fields
 * keyed by (number << 3) | wire type; little-endian fixed-width numbers; packed repeated scalars as one
 * length-delimited field). Enough to write ONNX models; no reading.
 */

/** Accumulates bytes of one message; nested messages are written by `message`. */
export class ProtoWriter {
  private chunks: Uint8Array[] = [];
  private size = 0;

  private push(bytes: Uint8Array): void {
    this.chunks.push(bytes);
    this.size += bytes.length;
  }

  /** Raw varint (non-negative integers up to 2^53, or negative int64 as 10-byte two's complement). */
  varint(value: number | bigint): this {
    let v = BigInt.asUintN(64, BigInt(value));
    const out: number[] = [];
    do {
      let b = Number(v & 0x7fn);
      v >>= 7n;
      if (v !== 0n) b |= 0x80;
      out.push(b);
    } while (v !== 0n);
    this.push(Uint8Array.from(out));
    return this;
  }

  private key(field: number, wire: number): void {
    this.varint(field * 8 + wire);
  }

  /** int32/int64/enum/bool field (wire type 0). */
  int(field: number, value: number | bigint): this {
    this.key(field, 0);
    return this.varint(value);
  }

  /** float field (wire type 5). */
  float(field: number, value: number): this {
    this.key(field, 5);
    const b = new Uint8Array(4);
    new DataView(b.buffer).setFloat32(0, value, true);
    this.push(b);
    return this;
  }

  /** bytes field (wire type 2). */
  bytes(field: number, value: Uint8Array): this {
    this.key(field, 2);
    this.varint(value.length);
    this.push(value);
    return this;
  }

  /** string field, UTF-8 (wire type 2). */
  string(field: number, value: string): this {
    return this.bytes(field, new TextEncoder().encode(value));
  }

  /** Embedded message field (wire type 2). */
  message(field: number, build: (w: ProtoWriter) => void): this {
    const inner = new ProtoWriter();
    build(inner);
    return this.bytes(field, inner.finish());
  }

  /** Packed repeated int64 field. */
  packedInts(field: number, values: ArrayLike<number>): this {
    const inner = new ProtoWriter();
    for (let i = 0; i < values.length; i++) inner.varint(values[i]);
    return this.bytes(field, inner.finish());
  }

  /** Packed repeated float field. */
  packedFloats(field: number, values: ArrayLike<number>): this {
    const b = new Uint8Array(values.length * 4);
    const dv = new DataView(b.buffer);
    for (let i = 0; i < values.length; i++) dv.setFloat32(i * 4, values[i], true);
    return this.bytes(field, b);
  }

  /** Packed repeated double field. */
  packedDoubles(field: number, values: ArrayLike<number>): this {
    const b = new Uint8Array(values.length * 8);
    const dv = new DataView(b.buffer);
    for (let i = 0; i < values.length; i++) dv.setFloat64(i * 8, values[i], true);
    return this.bytes(field, b);
  }

  /** The message's bytes. */
  finish(): Uint8Array {
    const out = new Uint8Array(this.size);
    let at = 0;
    for (const c of this.chunks) { out.set(c, at); at += c.length; }
    return out;
  }
}
