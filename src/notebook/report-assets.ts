/**
 * The scripts a report inlines so it works offline: vega, vega-lite and vega-embed, read from their installed
 * build files. Source-map comments are dropped and any `</script` is broken so the text cannot end its element.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { findPackageRoot } from './package-bridge.js';

const FILES: readonly [string, string][] = [
  ['vega', 'build/vega.min.js'],
  ['vega-lite', 'build/vega-lite.min.js'],
  ['vega-embed', 'build/vega-embed.min.js'],
];

let cached: string | null = null;

/** Make script text safe inside an inline `<script>` element. */
export function inlineScriptText(js: string): string {
  return js.replace(/\n?\/\/# sourceMappingURL=\S*\s*$/, '\n').replace(/<\/(script)/gi, '<\\/$1').replace(/<!--/g, '<\\!--');
}

/**
 * The inline `<script>` elements for vega, vega-lite and vega-embed (read once, then cached).
 * @example
 * const html = `<head>${chartScripts()}</head>`;
 */
export function chartScripts(): string {
  if (cached !== null) return cached;
  const root = findPackageRoot();
  const req = createRequire(join(root, 'package.json'));
  cached = FILES.map(([pkg, file]) => {
    // The package folder: the part of its resolved entry point up to `node_modules/<pkg>/`.
    const entry = req.resolve(pkg);
    const at = entry.lastIndexOf(`/node_modules/${pkg}/`);
    if (at < 0) throw new Error(`coppice report: package ${pkg} is not installed`);
    const dir = entry.slice(0, at + `/node_modules/${pkg}/`.length);
    return `<script>${inlineScriptText(readFileSync(join(dir, file), 'utf8'))}</script>`;
  }).join('\n');
  return cached;
}
