/**
 * Which files the web host may touch. It has no file dialogs, so the browser names paths; they
 * are confined to the project root folder (command line `--root`, default the current folder)
 * and, read-only, the bundled assets folder (demo projects).
 *
 * - Relative paths are taken relative to the project root.
 * - Reading: the real path (symlinks followed) must be inside the root or the assets folder.
 * - Writing: the real path of the parent folder must be inside the root and the target not
 *   inside the assets folder; an existing target that is a symlink is judged by where it points.
 */
import { promises as fs } from 'node:fs';
import path from 'node:path';
import { isInside } from './static-files.ts';

export type PathVerdict = { ok: true; path: string; readOnly: boolean } | { ok: false; error: string };

export class PathPolicy {
  private constructor(readonly root: string, readonly assetsDir: string | null) {}

  /** `root` and `assetsDir` are resolved to real paths once. */
  static async create(root: string, assetsDir: string | null): Promise<PathPolicy> {
    const realRoot = await fs.realpath(path.resolve(root));
    let realAssets: string | null = null;
    if (assetsDir) {
      try {
        realAssets = await fs.realpath(path.resolve(assetsDir));
      } catch {
        realAssets = null;
      }
    }
    return new PathPolicy(realRoot, realAssets);
  }

  private absolute(input: string): string {
    return path.resolve(this.root, input);
  }

  private inAssets(real: string): boolean {
    return this.assetsDir !== null && isInside(this.assetsDir, real);
  }

  private outside(input: string): PathVerdict {
    const where = this.assetsDir ? ` or the bundled demo folder ${this.assetsDir}` : '';
    return { ok: false, error: `"${input}" is outside the project folder ${this.root}${where}; the web host only opens and saves files there.` };
  }

  async forRead(input: string): Promise<PathVerdict> {
    const abs = this.absolute(input);
    let real: string;
    try {
      real = await fs.realpath(abs);
    } catch {
      if (!isInside(this.root, abs) && !this.inAssets(abs)) return this.outside(input);
      return { ok: false, error: `"${input}": file not found` };
    }
    if (this.inAssets(real)) return { ok: true, path: real, readOnly: true };
    if (isInside(this.root, real)) return { ok: true, path: real, readOnly: false };
    return this.outside(input);
  }

  async forWrite(input: string): Promise<PathVerdict> {
    const abs = this.absolute(input);
    let realParent: string;
    try {
      realParent = await fs.realpath(path.dirname(abs));
    } catch {
      if (!isInside(this.root, abs)) return this.outside(input);
      return { ok: false, error: `"${input}": the folder ${path.dirname(abs)} does not exist` };
    }
    let real = path.join(realParent, path.basename(abs));
    try {
      real = await fs.realpath(real);
    } catch {
      // A new file: the parent decides.
    }
    if (this.inAssets(real)) {
      return { ok: false, error: `"${input}" is a bundled demo file and read-only; use Save As to keep a copy in ${this.root}.` };
    }
    if (!isInside(this.root, real)) return this.outside(input);
    return { ok: true, path: real, readOnly: false };
  }

  /**
   * As forWrite, for Save As into a folder that does not exist yet: the missing folders are made
   * when the nearest existing one is (really) inside the root and not the assets folder.
   */
  async forNewFile(input: string): Promise<PathVerdict> {
    const abs = this.absolute(input);
    let dir = path.dirname(abs);
    let missing = false;
    for (;;) {
      try {
        await fs.stat(dir);
        break;
      } catch {
        missing = true;
        const up = path.dirname(dir);
        if (up === dir) return this.outside(input);
        dir = up;
      }
    }
    if (missing) {
      let existing: string;
      try {
        existing = await fs.realpath(dir);
      } catch {
        return this.outside(input);
      }
      if (!isInside(this.root, existing) || !isInside(this.root, abs) || this.inAssets(existing)) return this.outside(input);
      await fs.mkdir(path.dirname(abs), { recursive: true });
    }
    return this.forWrite(input);
  }
}
