/**
 * Presorting for the exact grower: for one numeric feature, the rows in ascending order of value with
 * ties kept in row order and rows whose value is missing (NaN) at the end, in row order.
 * A stable least-significant-digit radix sort on the IEEE-754 bits (sign-flipped so that unsigned
 * order is numeric order): four 16-bit passes, skipping passes where every key has the same digit.
 * The order depends only on values and row indices.
 */
import { errors } from '../../errors.js';

/** `rows` (ascending row indices) ordered by `values[row]`, NaN last; throws on ±Infinity. */
export function presortRows(values: Float64Array, rows: Int32Array, column: string): Int32Array {
  const n = rows.length;
  let nKnown = 0;
  for (let i = 0; i < n; i++) {
    const v = values[rows[i]];
    if (v === v) {
      if (v === Infinity || v === -Infinity) throw errors.badValue(column, rows[i], v, 'a finite number (NaN for missing)');
      nKnown++;
    }
  }
  // keys: hi and lo 32-bit words of the order-preserving transform of each known value
  const hi = new Uint32Array(nKnown), lo = new Uint32Array(nKnown);
  let idx = new Int32Array(nKnown);
  const out = new Int32Array(n);
  const f64 = new Float64Array(1), u32 = new Uint32Array(f64.buffer);
  const little = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1;
  const H = little ? 1 : 0, L = little ? 0 : 1;
  let tail = nKnown;
  for (let i = 0, j = 0; i < n; i++) {
    const r = rows[i];
    const v = values[r];
    if (v !== v) { out[tail++] = r; continue; }
    f64[0] = v === 0 ? 0 : v; // -0 sorts with +0
    let h = u32[H], l = u32[L];
    if (h & 0x80000000) { h = ~h >>> 0; l = ~l >>> 0; } else h = (h | 0x80000000) >>> 0;
    hi[j] = h; lo[j] = l; idx[j] = j; j++;
  }
  let tmp = new Int32Array(nKnown);
  const count = new Int32Array(65537);
  for (let pass = 0; pass < 4; pass++) {
    const words = pass < 2 ? lo : hi;
    const shift = (pass & 1) * 16;
    count.fill(0);
    for (let i = 0; i < nKnown; i++) count[((words[i] >>> shift) & 0xffff) + 1]++;
    let single = false;
    for (let d = 1; d <= 65536; d++) if (count[d] === nKnown) { single = true; break; }
    if (single || nKnown === 0) continue;
    for (let d = 0; d < 65536; d++) count[d + 1] += count[d];
    for (let i = 0; i < nKnown; i++) {
      const k = idx[i];
      tmp[count[(words[k] >>> shift) & 0xffff]++] = k;
    }
    const t = idx; idx = tmp; tmp = t;
  }
  // idx holds positions j (known rows in row order); map back to rows
  const knownRows = new Int32Array(nKnown);
  for (let i = 0, j = 0; i < n; i++) { const r = rows[i]; if (values[r] === values[r]) knownRows[j++] = r; }
  for (let i = 0; i < nKnown; i++) out[i] = knownRows[idx[i]];
  return out;
}
