import { describe, expect, it } from 'vitest';
import { renderInline, renderMarkdown } from '../../src/notebook/report-markdown.js';

// Expected HTML written by hand for each construct (Markdown's syntax as commonly used: headings, emphasis,
// lists, code, tables — common practice).
describe('renderMarkdown(source)', () => {
  it('renders headings, paragraphs, emphasis and code', () => {
    expect(renderMarkdown('# Title\n\nSome **bold** and *soft* text\nwith `x < 1`.')).toBe(
      '<h1>Title</h1>\n<p>Some <strong>bold</strong> and <em>soft</em> text with <code>x &lt; 1</code>.</p>');
  });
  it('renders lists, quotes, rules, fenced code and tables', () => {
    expect(renderMarkdown('- a\n- b\n\n1. one\n2. two')).toBe('<ul><li>a</li><li>b</li></ul>\n<ol><li>one</li><li>two</li></ol>');
    expect(renderMarkdown('> quoted')).toBe('<blockquote><p>quoted</p></blockquote>');
    expect(renderMarkdown('---')).toBe('<hr>');
    expect(renderMarkdown('```ts\nconst a = "<b>";\n```')).toBe('<pre><code>const a = &quot;&lt;b&gt;&quot;;</code></pre>');
    expect(renderMarkdown('| a | b |\n|---|---|\n| 1 | <i> |')).toBe(
      '<table><thead><tr><th>a</th><th>b</th></tr></thead><tbody><tr><td>1</td><td>&lt;i&gt;</td></tr></tbody></table>');
  });
  it('escapes raw HTML and drops unsafe link targets', () => {
    expect(renderMarkdown('<script>alert(1)</script>')).toBe('<p>&lt;script&gt;alert(1)&lt;/script&gt;</p>');
    expect(renderInline('[x](javascript:alert(1))')).not.toContain('href');
    expect(renderInline('[docs](https://example.org/a?b=1&c=2)')).toBe('<a href="https://example.org/a?b=1&amp;c=2">docs</a>');
    expect(renderInline('[here](#run-details)')).toBe('<a href="#run-details">here</a>');
    expect(renderInline('[a](x" onmouseover="y)')).not.toMatch(/onmouseover="/);
  });
  it('applies emphasis around code spans and leaves text inside them literal', () => {
    expect(renderInline('**`waste_pct`** and `**not bold**`')).toBe('<strong><code>waste_pct</code></strong> and <code>**not bold**</code>');
  });
  it('keeps snake_case words intact and handles empty input', () => {
    expect(renderInline('hours_since_harvest and truck_temp_c')).toBe('hours_since_harvest and truck_temp_c');
    expect(renderMarkdown('')).toBe('');
  });
});
