// Validation must work where code generation from strings is forbidden (the renderer's
// Content-Security-Policy has no 'unsafe-eval'). Node's --disallow-code-generation-from-strings
// makes eval and new Function throw, like such a page.
import { spawnSync } from 'node:child_process';
import { pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';
import { FIXTURE_DIR } from './fixtures.ts';

const indexUrl = pathToFileURL(new URL('../../../../main/common/project/index.ts', import.meta.url).pathname).href;

describe('validation without eval', () => {
  it('parses a valid and an invalid project with code generation disabled', () => {
    const script = `
      import { readFileSync } from 'node:fs';
      import { parseProjectText } from ${JSON.stringify(indexUrl)};
      let blocked = false;
      try { new Function('return 1'); } catch { blocked = true; }
      const good = parseProjectText(readFileSync(${JSON.stringify(`${FIXTURE_DIR}kestrel-moor-mast.stayset.json`)}, 'utf8'));
      const bad = parseProjectText(readFileSync(${JSON.stringify(`${FIXTURE_DIR}bad-fixed-letters.stayset.json`)}, 'utf8'));
      process.stdout.write(JSON.stringify({ blocked, good: good.ok, bad: bad.ok ? [] : bad.errors }));
    `;
    const r = spawnSync(process.execPath, ['--disallow-code-generation-from-strings', '--import', 'tsx', '--input-type=module', '-e', script], {
      encoding: 'utf8',
      timeout: 60_000,
    });
    expect(r.stderr).toBe('');
    expect(JSON.parse(r.stdout)).toEqual({
      blocked: true,
      good: true,
      bad: ['nodes[2] "AN1": "fixed" must be made of the letters x, y, z (translations) and rx, ry, rz (rotations), each at most once (got "xxz")'],
    });
  });
});
