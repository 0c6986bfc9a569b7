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

/** A share as a percentage with at most one decimal: "12.5%". */
export function formatShare(x: number): string {
  if (!Number.isFinite(x)) return String(x);
  const pct = Math.round(x * 1000) / 10;
  return `${pct}%`;
}
