/**
 * Escape text for HTML element content and attribute values (the five characters HTML reserves).
 */

/**
 * `text` with `& < > " '` replaced by character references.
 * @example
 * escapeHtml('<b>"a" & b</b>'); // '&lt;b&gt;&quot;a&quot; &amp; b&lt;/b&gt;'
 */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => entities[c]);
}

const entities: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };
