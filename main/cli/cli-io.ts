/**
 * What a command may touch besides its arguments: two output streams and the working folder.
 * Commands never call process.exit; they return an exit status (see EXIT).
 */
export interface CliIO {
  /** Results, exactly as documented (tables or JSON). */
  out(text: string): void;
  /** Messages about problems; never results. */
  err(text: string): void;
  /** Folder that relative file names are resolved against. */
  cwd: string;
}

/** Exit statuses shared by every command (a command may document further ones, e.g. check: 3). */
export const EXIT = {
  /** Done, and every analysis converged. */
  ok: 0,
  /** Output printed, but some analysis did not converge (or the solver failed). */
  notConverged: 1,
  /** Bad input: usage, options, unreadable or invalid project file. Nothing on stdout. */
  badInput: 2,
} as const;

/** A problem with the command line itself; the dispatcher prints it and exits with EXIT.badInput. */
export class UsageError extends Error {}
