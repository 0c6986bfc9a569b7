/**
 * One table cell as short text: numbers to at most 4 decimals (scientific when very large or small),
 * missing values as an empty mark, dates as ISO text, objects as compact JSON.
 */

/**
 * Display text for a cell value.
 * @example
 * formatCell(0.123456); // '0.1235'
 * formatCell(null);     // '·'
 */
export function formatCell(value: unknown): string {
  if (value === null || value === undefined) return '·';
  if (typeof value === 'number') {
    if (Number.isNaN(value)) return '·';
    if (!Number.isFinite(value) || Number.isInteger(value)) return String(value);
    const a = Math.abs(value);
    if (a >= 1e6 || a < 1e-4) return value.toExponential(3);
    return String(Number(value.toFixed(4)));
  }
  if (value instanceof Date) return Number.isNaN(value.getTime()) ? '·' : value.toISOString().replace('T00:00:00.000Z', '');
  if (typeof value === 'string') return value;
  if (typeof value === 'bigint' || typeof value === 'boolean') return String(value);
  try {
    return JSON.stringify(value) ?? String(value);
  } catch {
    return String(value);
  }
}
