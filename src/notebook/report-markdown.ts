/**
 * A small, safe Markdown renderer for the narrative cells of a report. It understands headings, paragraphs,
 * emphasis, code spans, fenced code, bullet and numbered lists, block quotes, rules, pipe tables and links.
 * All text is escaped first; raw HTML in the source shows as text; links keep only http(s), mailto, anchors and
 * relative targets.
 */
import { escapeHtml } from './report-escape.js';

function safeHref(url: string): string | null {
  const u = url.trim();
  if (/^(https?:|mailto:)/i.test(u) || u.startsWith('#')) return u;
  if (/^[a-z][a-z0-9+.-]*:/i.test(u) || u.startsWith('//')) return null;
  return u;
}

function emphasis(escaped: string): string {
  return escaped
    .replace(/\*\*(?=\S)([\s\S]*?\S)\*\*/g, '<strong>$1</strong>')
    .replace(/__(?=\S)([\s\S]*?\S)__/g, '<strong>$1</strong>')
    .replace(/(^|[^*\w])\*(?=\S)([^*]*?\S)\*(?!\w)/g, '$1<em>$2</em>')
    .replace(/(^|[^_\w])_(?=\S)([^_]*?\S)_(?!\w)/g, '$1<em>$2</em>');
}

function linksAndEmphasis(text: string): string {
  const out: string[] = [];
  const link = /\[([^\]\n]+)\]\(([^)\s]+)\)/g;
  let last = 0;
  for (const m of text.matchAll(link)) {
    out.push(emphasis(escapeHtml(text.slice(last, m.index))));
    const href = safeHref(m[2]);
    const label = emphasis(escapeHtml(m[1]));
    out.push(href === null ? label : `<a href="${escapeHtml(href)}">${label}</a>`);
    last = (m.index ?? 0) + m[0].length;
  }
  out.push(emphasis(escapeHtml(text.slice(last))));
  return out.join('');
}

/**
 * Render inline Markdown (code spans, emphasis, links) to HTML.
 * @example
 * renderInline('**late** parcels: `km > 40`'); // '<strong>late</strong> parcels: <code>km &gt; 40</code>'
 */
export function renderInline(text: string): string {
  // Code spans are set aside first (their text is literal), then links and emphasis apply around them.
  const spans: string[] = [];
  const held = text.replace(/\u0000/g, '').replace(/`([^`\n]+)`/g, (_, code: string) => {
    spans.push(`<code>${escapeHtml(code)}</code>`);
    return `\u0000${spans.length - 1}\u0000`;
  });
  return linksAndEmphasis(held).replace(/\u0000(\d+)\u0000/g, (_, i: string) => spans[Number(i)]);
}

function tableRow(line: string): string[] {
  return line.trim().replace(/^\|/, '').replace(/\|$/, '').split('|').map((c) => c.trim());
}

const LIST_ITEM = /^\s*([-*+]|\d+[.)])\s+(.*)$/;

/**
 * Render a Markdown cell to HTML.
 * @example
 * renderMarkdown('# Late parcels\n\nWhich parcels arrive **late**?');
 */
export function renderMarkdown(source: string): string {
  const lines = source.replace(/\r\n?/g, '\n').split('\n');
  const html: string[] = [];
  let para: string[] = [];
  const flush = () => { if (para.length) { html.push(`<p>${renderInline(para.join(' '))}</p>`); para = []; } };
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i];
    const fence = /^\s*(```|~~~)(.*)$/.exec(line);
    if (fence) {
      flush();
      const body: string[] = [];
      for (i++; i < lines.length && !lines[i].trim().startsWith(fence[1]); i++) body.push(lines[i]);
      html.push(`<pre><code>${escapeHtml(body.join('\n'))}</code></pre>`);
      continue;
    }
    if (line.trim() === '') { flush(); continue; }
    const heading = /^\s*(#{1,6})\s+(.*?)\s*#*\s*$/.exec(line);
    if (heading) { flush(); const n = heading[1].length; html.push(`<h${n}>${renderInline(heading[2])}</h${n}>`); continue; }
    if (/^\s*([-*_])(\s*\1){2,}\s*$/.test(line)) { flush(); html.push('<hr>'); continue; }
    if (/^\s*>/.test(line)) {
      flush();
      const body: string[] = [];
      for (; i < lines.length && /^\s*>/.test(lines[i]); i++) body.push(lines[i].replace(/^\s*>\s?/, ''));
      i--;
      html.push(`<blockquote>${renderMarkdown(body.join('\n'))}</blockquote>`);
      continue;
    }
    if (line.includes('|') && i + 1 < lines.length && /^\s*\|?\s*:?-+:?\s*(\|\s*:?-+:?\s*)*\|?\s*$/.test(lines[i + 1])) {
      flush();
      const head = tableRow(line);
      const rows: string[][] = [];
      for (i += 2; i < lines.length && lines[i].includes('|') && lines[i].trim() !== ''; i++) rows.push(tableRow(lines[i]));
      i--;
      html.push(`<table><thead><tr>${head.map((h) => `<th>${renderInline(h)}</th>`).join('')}</tr></thead><tbody>`
        + rows.map((r) => `<tr>${head.map((_, j) => `<td>${renderInline(r[j] ?? '')}</td>`).join('')}</tr>`).join('')
        + '</tbody></table>');
      continue;
    }
    const item = LIST_ITEM.exec(line);
    if (item) {
      flush();
      const ordered = /\d/.test(item[1]);
      const items: string[] = [];
      for (; i < lines.length; i++) {
        const m = LIST_ITEM.exec(lines[i]);
        if (m) items.push(m[2]);
        else if (/^\s{2,}\S/.test(lines[i]) && items.length) items[items.length - 1] += ` ${lines[i].trim()}`;
        else break;
      }
      i--;
      const tag = ordered ? 'ol' : 'ul';
      html.push(`<${tag}>${items.map((t) => `<li>${renderInline(t)}</li>`).join('')}</${tag}>`);
      continue;
    }
    para.push(line.trim());
  }
  flush();
  return html.join('\n');
}
