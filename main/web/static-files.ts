/**
 * Mapping of URL paths to files of the built renderer, with no way out of the root:
 * the path is URL-decoded, must not contain NUL or backslashes, is normalised, and the resolved
 * real path (symlinks followed) must lie inside the root's real path. Also used by the desktop
 * shell's app protocol.
 */
import { promises as fs } from 'node:fs';
import path from 'node:path';

const CONTENT_TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.map': 'application/json; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.jpg': 'image/jpeg',
  '.jpeg': 'image/jpeg',
  '.gif': 'image/gif',
  '.webp': 'image/webp',
  '.ico': 'image/x-icon',
  '.woff': 'font/woff',
  '.woff2': 'font/woff2',
  '.ttf': 'font/ttf',
  '.wasm': 'application/wasm',
  '.txt': 'text/plain; charset=utf-8',
};

export function contentTypeFor(file: string): string {
  return CONTENT_TYPES[path.extname(file).toLowerCase()] ?? 'application/octet-stream';
}

export function isInside(base: string, candidate: string): boolean {
  const rel = path.relative(base, candidate);
  return rel === '' || (!rel.startsWith('..') && !path.isAbsolute(rel));
}

/**
 * The file for a URL path (`/` → index.html), or null when the path is malformed, escapes the
 * root, or names no regular file. `root` must be an absolute path.
 */
export async function resolveStaticFile(root: string, urlPath: string): Promise<string | null> {
  let decoded: string;
  try {
    decoded = decodeURIComponent(urlPath.split('?')[0].split('#')[0]);
  } catch {
    return null;
  }
  if (decoded.includes('\0') || decoded.includes('\\') || !decoded.startsWith('/')) return null;
  const segments = decoded.split('/');
  if (segments.some((s) => s === '..')) return null;
  const relative = decoded === '/' ? 'index.html' : decoded.slice(1);
  const candidate = path.resolve(root, relative);
  if (!isInside(root, candidate)) return null;
  try {
    const realRoot = await fs.realpath(root);
    const real = await fs.realpath(candidate);
    if (!isInside(realRoot, real)) return null;
    const stat = await fs.stat(real);
    return stat.isFile() ? real : null;
  } catch {
    return null;
  }
}
