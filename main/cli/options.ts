/**
 * A small, strict command-line option parser: `--name value`, `--name=value`, boolean flags,
 * repeatable options, and `--` to end options. Unknown options and missing values throw
 * UsageError with a message naming the option.
 */
import { UsageError } from './cli-io.ts';

export interface OptionSpec {
  type: 'boolean' | 'string';
  /** String options only: may be given more than once (values collected in order). */
  multiple?: boolean;
}

export interface ParsedOptions {
  flags: Set<string>;
  values: Map<string, string[]>;
  positionals: string[];
}

export function parseOptions(args: readonly string[], spec: Record<string, OptionSpec>): ParsedOptions {
  const parsed: ParsedOptions = { flags: new Set(), values: new Map(), positionals: [] };
  for (let k = 0; k < args.length; k++) {
    const arg = args[k];
    if (arg === '--') {
      parsed.positionals.push(...args.slice(k + 1));
      break;
    }
    if (!arg.startsWith('-') || arg === '-') {
      parsed.positionals.push(arg);
      continue;
    }
    const eq = arg.indexOf('=');
    const name = arg.startsWith('--') ? arg.slice(2, eq < 0 ? undefined : eq) : '';
    const option = name === '' ? undefined : spec[name];
    if (!option) throw new UsageError(`unknown option "${eq < 0 ? arg : arg.slice(0, eq)}"`);
    if (option.type === 'boolean') {
      if (eq >= 0) throw new UsageError(`option "--${name}" takes no value`);
      parsed.flags.add(name);
      continue;
    }
    let value: string | undefined;
    if (eq >= 0) value = arg.slice(eq + 1);
    else if (k + 1 < args.length && !args[k + 1].startsWith('--')) value = args[++k];
    if (value === undefined || value === '') throw new UsageError(`option "--${name}" needs a value`);
    const list = parsed.values.get(name) ?? [];
    if (list.length > 0 && !option.multiple) throw new UsageError(`option "--${name}" may be given only once`);
    list.push(value);
    parsed.values.set(name, list);
  }
  return parsed;
}
