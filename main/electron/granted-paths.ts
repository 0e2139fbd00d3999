/**
 * Paths the desktop host has handed to the renderer (opened, chosen in a save dialog, recovered,
 * the start file). save(path) is accepted only for these, so a compromised page cannot make the
 * host write anywhere else. Compared after path.resolve (and case-folded on Windows and macOS).
 */
import path from 'node:path';

export class GrantedPaths {
  private readonly paths = new Set<string>();
  constructor(private readonly platform: NodeJS.Platform = process.platform) {}

  private key(p: string): string {
    const r = path.resolve(p);
    return this.platform === 'win32' || this.platform === 'darwin' ? r.toLowerCase() : r;
  }

  grant(p: string): void {
    this.paths.add(this.key(p));
  }

  has(p: string): boolean {
    return this.paths.has(this.key(p));
  }
}
