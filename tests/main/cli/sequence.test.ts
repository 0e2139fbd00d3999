/** `stayset sequence` on the demo mast: JSON output, crew sheet, bad input. */
import { describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runStayset } from './run-stayset.ts';

describe('stayset sequence', () => {
  it('prints every stage as JSON, the final state equal to the design state, and writes the crew sheet', () => {
    const dir = mkdtempSync(join(tmpdir(), 'stayset-seq-'));
    try {
      const out = join(dir, 'crew.html');
      const r = runStayset(['sequence', 'assets/demo-mast.stayset', '--sequence', 'bottom up', '--json', '--html', out, '--date', '2026-12-01']);
      expect(r.stderr).toContain('wrote');
      expect(r.code).toBe(0);
      const json = JSON.parse(r.stdout);
      expect(json.disclaimer).toContain('qualified engineer');
      const seq = json.sequences[0];
      expect(seq.ok).toBe(true);
      expect(seq.stages).toHaveLength(3);
      expect(seq.finalDifference).toBeLessThan(1e-7);
      // Level 1 set first reads differently from its design tension (the others are not in yet).
      const first = seq.stages[0].settings[0];
      const design = seq.design.find((d: { member: string }) => d.member === first.member).tension;
      expect(Math.abs(first.value / design - 1)).toBeGreaterThan(0.005);
      const html = readFileSync(out, 'utf8');
      expect(html).toContain('Results are for review by a qualified engineer');
      expect(html).toContain('counter(pages)');
      expect(html).toContain((first.value / 1000).toFixed(1));
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('names an unknown sequence and exits 2', () => {
    const r = runStayset(['sequence', 'assets/demo-mast.stayset', '--sequence', 'nope']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('sequence "nope" does not exist');
    expect(r.stdout).toBe('');
  });
});
