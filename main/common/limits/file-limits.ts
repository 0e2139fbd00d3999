/**
 * The one size limit on project files, shared by every edition: the CLI, the desktop and the web
 * host read nothing larger, and the web host accepts request bodies of this plus a margin for the
 * call's other arguments. A large real project is a few MB of JSON (a 250 × 250 cable net is
 * about 6 MB); the limit leaves room for ten times that.
 */
export const MAX_PROJECT_FILE_BYTES = 64 * 1024 * 1024;

/** Extra bytes a web request may carry beside one project (path, title, JSON wrapper). */
export const REQUEST_MARGIN_BYTES = 1024 * 1024;

/** "64 MB" style text for a byte limit (MiB, as the limit is a power of two). */
export function byteLimitText(bytes: number): string {
  return `${Math.round(bytes / (1024 * 1024))} MB`;
}
