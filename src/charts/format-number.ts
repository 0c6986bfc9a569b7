/**
 * Short number labels for text drawn on charts (the axes use vega's own formats): three significant
 * digits, thousands separated, no trailing zeros.
 */
const small = new Intl.NumberFormat('en-US', { maximumSignificantDigits: 3 });
const large = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });

/**
 * A compact label for `x`.
 *
 * @example
 * formatNumber(0.012345); // "0.0123"
 * formatNumber(12345.6);  // "12,346"
 */
export function formatNumber(x: number): string {
  if (!Number.isFinite(x)) return String(x);
  if (x === 0) return '0';
  const text = Math.abs(x) >= 1000 ? large.format(x) : small.format(x);
  return text.replace('-', '−');
}

/** `x` with an explicit sign: "+0.12", "−0.3", "0". */
export function formatSigned(x: number): string {
  const text = formatNumber(x);
  return x > 0 ? `+${text}` : text;
}

/** A share as a percentage with at most one decimal: "12.5%"; "<0.1%" / ">99.9%" rather than a rounded 0 or 100. */
export function formatShare(x: number): string {
  if (!Number.isFinite(x)) return String(x);
  if (x > 0 && x < 0.0005) return '<0.1%';
  if (x < 1 && x >= 0.9995) return '>99.9%';
  const pct = Math.round(x * 1000) / 10;
  return `${pct}%`;
}

/**
 * One formatter for a set of values drawn side by side (e.g. bar labels): the same number of decimals for
 * all, chosen so the largest magnitude keeps three significant digits (at most 6 decimals), thousands
 * separated, a true minus sign. As percentages (`percent` true) the largest keeps three significant digits
 * with at most 2 decimals.
 *
 * @example
 * const f = formatterFor([0.142, 0.004, -0.002]); // f(0.004) === "0.004", f(-0.002) === "−0.002"
 * formatterFor([0.6, 0.3, 0.1], true)(0.1);      // "10.0%"
 */
export function formatterFor(values: readonly number[], percent = false): (x: number) => string {
  let top = 0;
  for (const v of values) if (Number.isFinite(v)) top = Math.max(top, Math.abs(percent ? v * 100 : v));
  const magnitude = top > 0 ? Math.floor(Math.log10(top)) : 0;
  const decimals = Math.min(percent ? 2 : 6, Math.max(0, 2 - magnitude));
  const fmt = new Intl.NumberFormat('en-US', { minimumFractionDigits: decimals, maximumFractionDigits: decimals, signDisplay: 'negative' });
  return (x) => {
    if (!Number.isFinite(x)) return String(x);
    const text = fmt.format(percent ? x * 100 : x).replace('-', '−');
    return percent ? `${text}%` : text;
  };
}

/** Whether `values` are shares of a whole: none negative and they sum to 1 (within 1e-6). */
export function isShareOfWhole(values: readonly number[]): boolean {
  if (values.length === 0) return false;
  let sum = 0;
  for (const v of values) { if (!(v >= 0)) return false; sum += v; }
  return Math.abs(sum - 1) <= 1e-6;
}
