/**
 * Demo projects for the editor tests: a bundled demo as read from assets/, and the demo mast
 * without its own ancillaries and loss cases, so the entries a test adds are the first of their lists.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { ProjectFile } from '../../solver/index.ts';

export const readDemo = (name: string) => JSON.parse(readFileSync(fileURLToPath(new URL(`../../assets/${name}`, import.meta.url)), 'utf8')) as ProjectFile;

export function mastWithoutOwnActions(): ProjectFile {
  const p = readDemo('demo-mast.stayset');
  delete p.ancillaries;
  delete p.memberLoss;
  return p;
}
