/**
 * Escaping for HTML built from data: every value taken from a notebook, an extract or a record goes through
 * `escapeHtml` before it is placed in markup.
 */

const ENTITIES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/**
 * Escape text for HTML element content and quoted attribute values.
 * @example
 * escapeHtml('<script>'); // '&lt;script&gt;'
 */
export function escapeHtml(value: unknown): string {
  return String(value ?? '').replace(/[&<>"']/g, (c) => ENTITIES[c]);
}

/**
 * JSON for embedding inside a `<script>` element: `<`, `>`, `&` and line separators are escaped so no value can
 * close the element or start a comment.
 * @example
 * scriptJson({ label: '</script>' }); // '{"label":"\\u003c/script\\u003e"}'
 */
export function scriptJson(value: unknown): string {
  return JSON.stringify(value)
    .replace(/</g, '\\u003c').replace(/>/g, '\\u003e').replace(/&/g, '\\u0026')
    .replace(/\u2028/g, '\\u2028').replace(/\u2029/g, '\\u2029');
}
