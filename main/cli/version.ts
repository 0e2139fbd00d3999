/** The package version, read from package.json next to the sources (no build step). */
import { readFileSync } from 'node:fs';

export function packageVersion(): string {
  const url = new URL('../../package.json', import.meta.url);
  const pkg = JSON.parse(readFileSync(url, 'utf8')) as { version?: string };
  return pkg.version ?? 'unknown';
}
