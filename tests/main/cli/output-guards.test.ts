// Output guards and helpers, in process: non-finite numbers never reach the output, table
// layout, number text, and the option parser.
import { describe, expect, it } from 'vitest';
import { makeSolveCommand } from '../../../main/cli/commands/solve.ts';
import type { ProjectSolver } from '../../../main/cli/commands/solve.ts';
import { dispatch } from '../../../main/cli/dispatch.ts';
import type { CliIO } from '../../../main/cli/cli-io.ts';
import { replaceNonFinite } from '../../../main/cli/format/finite-guard.ts';
import { fixedText, formatValue } from '../../../main/common/units/index.ts';
import { textTable } from '../../../main/cli/format/text-table.ts';
import { jsonOutput } from '../../../main/cli/format/json-output.ts';
import { parseOptions } from '../../../main/cli/options.ts';
import type { CaseResult } from '../../../solver/index.ts';
import { REPO_ROOT, fixture } from './run-stayset.ts';

function memoryIO(): CliIO & { stdout: string; stderr: string } {
  const io = { stdout: '', stderr: '', cwd: REPO_ROOT, out: (t: string) => void (io.stdout += t), err: (t: string) => void (io.stderr += t) };
  return io;
}

/** A broken solver: returns a converged-looking case with NaN and Infinity in it. */
const brokenSolver: ProjectSolver = () => {
  const c: CaseResult = {
    id: 'pull', converged: true, status: 'converged', slackMembers: [],
    nodes: [{ id: 'B', position: [10, 0, 0], displacement: [NaN, 0, 0] }],
    members: [{ id: 'R1', tensionMax: Infinity, tensionMin: 0, tensionStart: 0, tensionEnd: 0, slack: false, sag: 0, chordLength: 10 }],
    reactions: [], stats: { dofs: 1, iterations: 1, seconds: 0, factorSeconds: 0, loadSteps: 1, residual: 0 },
  };
  return { report: { cases: [c] }, fields: [] };
};

describe('non-finite guard', () => {
  it('replaces NaN and ±Infinity by null and lists where', () => {
    const g = replaceNonFinite({ a: [1, NaN], b: { c: -Infinity, d: 'x' } });
    expect(g).toEqual({ value: { a: [1, null], b: { c: null, d: 'x' } }, paths: ['a[1]', 'b.c'] });
  });

  it('solve fails loudly (exit 1) when the solver hands back a non-finite number, JSON stays valid', async () => {
    const io = memoryIO();
    const code = await dispatch(['solve', fixture('axial-bar.stayset.json'), '--json'], io, [makeSolveCommand(brokenSolver)], { version: '0' });
    expect(code).toBe(1);
    const out = JSON.parse(io.stdout) as { cases: CaseResult[] };
    expect(out.cases[0].nodes[0].displacement[0]).toBeNull();
    expect(io.stderr).toContain('non-finite numbers');
    expect(io.stderr).toContain('cases[0].nodes[0].displacement[0]');
    expect(io.stderr).toContain('cases[0].members[0].tensionMax');
  });

  it('a solver that throws gives exit 1 and a message, nothing on stdout', async () => {
    const io = memoryIO();
    const throwing: ProjectSolver = () => {
      throw new Error('out of memory in factorisation');
    };
    const code = await dispatch(['solve', fixture('axial-bar.stayset.json')], io, [makeSolveCommand(throwing)], { version: '0' });
    expect(code).toBe(1);
    expect(io.stdout).toBe('');
    expect(io.stderr).toContain('the analysis failed: out of memory in factorisation');
  });
});

describe('text helpers (common practice for fixed-width reports)', () => {
  it('never prints negative zero and shows — for non-finite values', () => {
    expect(fixedText(-0.0004, 3)).toBe('0.000');
    expect(fixedText(-0.0006, 3)).toBe('-0.001');
    expect(formatValue(-1, 'force', 'SI')).toBe('0.00');
    expect(formatValue(12345.6, 'force', 'SI')).toBe('12.35');
    expect(fixedText(NaN, 2)).toBe('—');
  });

  it('aligns columns: text left, numbers right', () => {
    const t = textTable([{ title: 'id' }, { title: 'T kN', align: 'right' }], [['G1', '1.00'], ['LONGID', '123.45']], '');
    expect(t.split('\n')).toEqual(['id        T kN', '------  ------', 'G1        1.00', 'LONGID  123.45']);
  });
});

describe('JSON output layout', () => {
  it('puts number lists on one line and reads back to the same value', () => {
    const v = { a: [1, -2.5e-7, null, 3], b: [{ c: [0, 0] }], s: 'x[\n1\n]', e: [], m: ['p', 1] };
    const text = jsonOutput(v);
    expect(JSON.parse(text)).toEqual(v);
    expect(text).toContain('"a": [1, -2.5e-7, null, 3]');
    expect(text).toContain('"c": [0, 0]');
    expect(text.endsWith('}\n')).toBe(true);
  });
});

describe('solve --json of a large result', () => {
  // A result of several MiB goes out in chunks while it is written (json-output.ts): the chunks
  // together are the writer's text of {cases, disclaimer}, with the stats object added last.
  const bigReport = () => {
    const nodes = Array.from({ length: 40000 }, (_, i) => ({ id: `N${i}`, position: [i, 0.1 * i, -1 / (i + 1)] as [number, number, number], displacement: [0, 1e-9 * i, -2.5e-3] as [number, number, number] }));
    const c: CaseResult = {
      id: 'big', converged: true, status: 'converged', slackMembers: [], nodes, members: [], reactions: [],
      stats: { dofs: 3, iterations: 1, seconds: 0, factorSeconds: 0, loadSteps: 1, residual: 0 },
    };
    return { report: { cases: [c] }, fields: [] };
  };
  const many: ProjectSolver = bigReport;

  it('writes several chunks that parse to the result, stats last', async () => {
    const chunks: string[] = [];
    const io = memoryIO();
    const out = io.out;
    io.out = (t: string) => { chunks.push(t); out(t); };
    const code = await dispatch(['solve', fixture('axial-bar.stayset.json'), '--json'], io, [makeSolveCommand(many)], { version: '0' });
    expect(code).toBe(0);
    expect(chunks.length).toBeGreaterThan(2);
    const parsed = JSON.parse(io.stdout) as { cases: unknown; disclaimer: string; stats: Record<string, number> };
    const expected = JSON.parse(jsonOutput({ cases: bigReport().report.cases, disclaimer: parsed.disclaimer })) as object;
    const { stats, ...rest } = parsed;
    expect(rest).toEqual(expected);
    expect(Object.keys(stats)).toEqual(['inputSeconds', 'analysisSeconds', 'newtonSeconds', 'outputSeconds', 'seconds']);
    expect(io.stdout.lastIndexOf('"stats"')).toBeGreaterThan(io.stdout.lastIndexOf('"disclaimer"'));
  });
});

describe('option parser', () => {
  const spec = { json: { type: 'boolean' as const }, case: { type: 'string' as const, multiple: true } };
  it('flags, repeated values, --name=value and -- ', () => {
    const p = parseOptions(['a.json', '--json', '--case', 'x', '--case=y', '--', '--weird'], spec);
    expect([...p.flags]).toEqual(['json']);
    expect(p.values.get('case')).toEqual(['x', 'y']);
    expect(p.positionals).toEqual(['a.json', '--weird']);
  });
  it('rejects unknown options and short flags it does not know', () => {
    expect(() => parseOptions(['-j'], spec)).toThrow('unknown option "-j"');
    expect(() => parseOptions(['--cases=x'], spec)).toThrow('unknown option "--cases"');
  });
});
