/**
 * Crash safety of atomic saves: a child process saves a several-MB project in a loop,
 * alternating two versions; it is killed with SIGKILL the moment it announces save k (k = 1, 2 in
 * turn, so saves of both versions are hit), many times. After every kill the target must be exactly the complete old or the complete
 * new version (never missing, truncated or mixed), and so must the backup.
 * Kills are counted by where they landed, not by the clock: one whose save k never reported
 * "done" was a kill during a save, and the test goes on until MID_SAVE_KILLS of those happened
 * (a loaded machine only takes more attempts), within MAX_ATTEMPTS. The time limit of the test
 * is a generous guard for a saturated machine (each attempt starts a Node process), not a
 * measure.
 * Method: write-temp + fsync + rename, the POSIX rename(2) atomic-replacement guarantee.
 */
import { spawn } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'esbuild';
import { describe, expect, it } from 'vitest';
import { parseProjectText, serializeProject } from '../../../main/common/project/index.ts';
import { writeFileAtomic } from '../../../main/store/atomic-write.ts';
import { largeGrid } from './sample-project.ts';

const writerSource = path.join(path.dirname(fileURLToPath(import.meta.url)), 'crash-writer.ts');
const MID_SAVE_KILLS = 40;
const MAX_ATTEMPTS = 400;

/** Starts the writer, kills it when it begins save k; true when save k had not finished. */
function runAndKill(writer: string, args: string[], k: number): Promise<boolean> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [writer, ...args], { stdio: ['ignore', 'pipe', 'pipe'] });
    let err = '', out = '', killed = false;
    child.stderr.on('data', (d) => (err += String(d)));
    child.stdout.on('data', (d) => {
      out += String(d);
      if (!killed && out.includes(`begin ${k}\n`)) { killed = true; child.kill('SIGKILL'); }
    });
    child.on('exit', (code, signal) => (signal === 'SIGKILL' ? resolve(!out.includes(`done ${k}\n`)) : reject(new Error(`writer exited ${code}: ${err}`))));
  });
}

describe('atomic save under SIGKILL', () => {
  it('leaves the target and its backup as one complete version after every kill', { timeout: 900_000 }, async () => {
    const dir = mkdtempSync(path.join(os.tmpdir(), 'stayset-crash-'));
    // The writer is bundled to plain JavaScript first so each start takes milliseconds, not a
    // TypeScript loader's start-up; it runs the store's own writeFileAtomic.
    const writer = path.join(dir, 'crash-writer.mjs');
    await build({ entryPoints: [writerSource], outfile: writer, bundle: true, platform: 'node', format: 'esm', logLevel: 'silent' });
    const a = serializeProject(largeGrid(105, 'A'));
    const b = serializeProject(largeGrid(105, 'BB'));
    expect(a.length).toBeGreaterThan(3_000_000);
    expect(parseProjectText(a).ok && parseProjectText(b).ok).toBe(true);
    const fileA = path.join(dir, 'a.txt');
    const fileB = path.join(dir, 'b.txt');
    writeFileSync(fileA, a);
    writeFileSync(fileB, b);
    const target = path.join(dir, 'grid.stayset');
    // A previous version exists from the start, so every save has something to back up.
    await writeFileAtomic(target, b);
    let kills = 0, midSave = 0;
    const seen = new Set<string>();
    while (midSave < MID_SAVE_KILLS && kills < MAX_ATTEMPTS) {
      if (await runAndKill(writer, [target, fileA, fileB], 1 + (kills % 2))) midSave++;
      kills++;
      const text = readFileSync(target, 'utf8');
      expect(text === a || text === b, `kill ${kills}: target is neither complete version (${text.length} chars)`).toBe(true);
      seen.add(text === a ? 'A' : 'B');
      const backup = readFileSync(target + '.bak', 'utf8');
      expect(backup === a || backup === b, `kill ${kills}: backup incomplete`).toBe(true);
    }
    expect(midSave, `${midSave} of ${kills} kills landed during a save`).toBe(MID_SAVE_KILLS);
    expect(seen.size).toBe(2); // saves of both parities were interrupted or completed
    // Leftover temp files of killed writers are removed by the next save.
    await writeFileAtomic(target, a, { backup: true });
    expect(readdirSync(dir).sort()).toEqual(['a.txt', 'b.txt', 'crash-writer.mjs', 'grid.stayset', 'grid.stayset.bak']);
  });
});
