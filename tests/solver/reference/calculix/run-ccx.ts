/**
 * CalculiX (the general FE code `ccx`, Debian package calculix-ccx) as an independent reference
 * for the beam-column. Writes an input deck to a throw-away folder, runs `ccx`, and reads the
 * nodal displacement tables of the `.dat` file. Missing `ccx` fails with a message saying what to
 * install; STAYSET_SKIP_REFERENCE_CODES=1 skips these checks deliberately.
 * Written for the tests only; it shares no code with the solver.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';

export const CCX = process.env.STAYSET_CCX ?? 'ccx';
export const SKIP_REFERENCE_CODES = process.env.STAYSET_SKIP_REFERENCE_CODES === '1';

/** Displacements (vx, vy, vz) of one node at each printed time of the step(s), in input order. */
export interface CcxNodeHistory {
  time: number;
  u: [number, number, number];
}

/** Runs `ccx` on `deck` and returns the printed displacement history of `node`. */
export function runCcx(deck: string, node: number): CcxNodeHistory[] {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'stayset-ccx-'));
  try {
    writeFileSync(path.join(dir, 'job.inp'), deck);
    try {
      execFileSync(CCX, ['job'], { cwd: dir, stdio: 'pipe', maxBuffer: 64 << 20 });
    } catch (e) {
      if ((e as NodeJS.ErrnoException).code === 'ENOENT') {
        throw new Error(`the CalculiX reference checks need ${CCX}: apt-get install -y calculix-ccx, `
          + 'or set STAYSET_SKIP_REFERENCE_CODES=1 to skip them deliberately');
      }
      throw e;
    }
    return parseDisplacements(readFileSync(path.join(dir, 'job.dat'), 'utf8'), node);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Reads "displacements (vx,vy,vz) for set … and time t" blocks of a ccx `.dat` file. */
export function parseDisplacements(dat: string, node: number): CcxNodeHistory[] {
  const out: CcxNodeHistory[] = [];
  let time = NaN;
  for (const line of dat.split('\n')) {
    const head = /displacements \(vx,vy,vz\).*time\s+(\S+)/.exec(line);
    if (head) { time = Number(head[1]); continue; }
    const cols = line.trim().split(/\s+/);
    if (cols.length === 4 && Number(cols[0]) === node && Number.isFinite(time)) {
      out.push({ time, u: [Number(cols[1]), Number(cols[2]), Number(cols[3])] });
    }
  }
  return out;
}
