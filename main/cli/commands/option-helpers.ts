/** Small helpers shared by the site commands (sequence, asbuilt, report). */
import { UsageError } from '../cli-io.ts';
import type { ParsedOptions } from '../options.ts';

export function singleOption(opts: ParsedOptions, name: string): string | undefined {
  const v = opts.values.get(name);
  if (!v) return undefined;
  if (v.length > 1) throw new UsageError(`option "--${name}" given more than once`);
  return v[0];
}

/** Today's local date as YYYY-MM-DD. */
export function isoToday(): string {
  const d = new Date();
  const p = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${p(d.getMonth() + 1)}-${p(d.getDate())}`;
}
