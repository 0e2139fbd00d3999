/**
 * Paths the desktop host has handed to the renderer (opened, chosen in a save dialog, recovered,
 * the start file). save(path) and autosave(path) are accepted only for these, so a compromised
 * page cannot make the host write anywhere else. Paths the system asked to open (command line,
 * file association, second instance, the Open Recent menu) are `offered`: the page may open
 * them (which grants them), nothing else. Compared after path.resolve (and case-folded on
 * Windows and macOS).
 */
import path from 'node:path';

export class GrantedPaths {
  private readonly paths = new Set<string>();
  private readonly offered = new Set<string>();
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

  /** The system asked to open `p`: the page may open it. */
  offer(p: string): void {
    this.offered.add(this.key(p));
  }

  /** May the page open `p` by path (granted or offered)? */
  mayOpen(p: string): boolean {
    const k = this.key(p);
    return this.paths.has(k) || this.offered.has(k);
  }
}
