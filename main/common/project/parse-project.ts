/**
 * parseProjectText: text of a .stayset.json file → validated project, or messages.
 * Empty and truncated files are named as such; other JSON syntax errors give line and column.
 */
import { lineColumn, scanJson } from './text/json-scan.ts';
import type { ParseOutcome } from './outcome.ts';
import type { MigrateOptions } from './migrations/migrate-document.ts';
import { validateProject } from './validate-project.ts';

export function parseProjectText(text: string, options: MigrateOptions = {}): ParseOutcome {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  if (body.trim() === '') return { ok: false, errors: ['the file is empty (no JSON at all)'] };
  const problem = scanJson(body);
  if (problem) {
    const { line, column } = lineColumn(body, problem.offset);
    const where = `line ${line}, column ${column}`;
    const msg = problem.truncated
      ? `the file is truncated: it ends at ${where} in the middle of the JSON (${problem.problem})`
      : `not valid JSON at ${where}: ${problem.problem}`;
    return { ok: false, errors: [msg] };
  }
  let data: unknown;
  try {
    data = JSON.parse(body);
  } catch (e) {
    // The scanner accepted the text, so this would be a scanner bug; still report it plainly.
    return { ok: false, errors: [`not valid JSON: ${(e as Error).message}`] };
  }
  return validateProject(data, options);
}
