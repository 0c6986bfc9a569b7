import { it } from 'vitest';
import { gallery } from './gallery.js';
import { checkSpec } from './validate-spec.js';
it('dbg', async () => {
  const g = gallery();
  for (const name of (process.env.NAMES ?? '').split(',')) {
    const r = await checkSpec(g[name]);
    console.log('##', name, JSON.stringify(r.schema, null, 1), JSON.stringify(r.warnings, null, 1));
  }
});
