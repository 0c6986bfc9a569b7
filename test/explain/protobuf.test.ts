/**
 * ProtoWriter against the worked examples of the Protocol Buffers documentation, "Encoding"
 * (protobuf.dev/programming-guides/encoding): Test1 { int32 a = 1 } with a = 150 → 08 96 01;
 * Test2 { string b = 2 } with b = "testing" → 12 07 74 65 73 74 69 6e 67; Test5 { repeated int32 f = 6
 * [packed] } with [3, 270, 86942] → 32 06 03 8e 02 9e a7 05 (the last two from memory of that page);
 * negative int32/int64 are 10-byte varints (two's complement), as that page states.
 */
import { describe, expect, it } from 'vitest';
import { ProtoWriter } from '../../src/explain/protobuf.js';

const hex = (b: Uint8Array): string => Array.from(b, (x) => x.toString(16).padStart(2, '0')).join(' ');

describe('ProtoWriter', () => {
  it('int(1, 150) → 08 96 01', () => expect(hex(new ProtoWriter().int(1, 150).finish())).toBe('08 96 01'));
  it('string(2, "testing") → 12 07 74 65 73 74 69 6e 67', () => {
    expect(hex(new ProtoWriter().string(2, 'testing').finish())).toBe('12 07 74 65 73 74 69 6e 67');
  });
  it('packedInts(6, [3, 270, 86942]) → 32 06 03 8e 02 9e a7 05', () => {
    expect(hex(new ProtoWriter().packedInts(6, [3, 270, 86942]).finish())).toBe('32 06 03 8e 02 9e a7 05');
  });
  it('int(1, -1) is a 10-byte varint', () => {
    expect(hex(new ProtoWriter().int(1, -1).finish())).toBe('08 ff ff ff ff ff ff ff ff ff 01');
  });
  it('message(3, ...) nests with a length prefix; Test1 inside field 3 → 1a 03 08 96 01', () => {
    expect(hex(new ProtoWriter().message(3, (w) => w.int(1, 150)).finish())).toBe('1a 03 08 96 01');
  });
  it('float(2, 1) is wire type 5, little-endian IEEE 754 (1.0f = 0x3f800000)', () => {
    expect(hex(new ProtoWriter().float(2, 1).finish())).toBe('15 00 00 80 3f');
  });
  it('packedDoubles(10, [1]) → 52 08 then 1.0 as little-endian double (0x3ff0000000000000)', () => {
    expect(hex(new ProtoWriter().packedDoubles(10, [1]).finish())).toBe('52 08 00 00 00 00 00 00 f0 3f');
  });
});
