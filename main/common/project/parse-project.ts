/**
 * parseProjectText: text of a .stayset.json file → validated project, or messages.
 * Empty and truncated files are named as such; other JSON syntax errors give line and column.
 * The text is read once, by JSON.parse; the strict scanner (json-scan.ts), which finds the line
 * and column of a problem and the property names JSON.parse would silently drop, runs only when
 * JSON.parse refuses the text or parsed-shape.ts finds it suspect.
 */
import { lineColumn, scanJson, type JsonProblem } from './text/json-scan.ts';
import { parsedTextSuspect } from './text/parsed-shape.ts';
import type { ParseOutcome } from './outcome.ts';
import type { MigrateOptions } from './migrations/migrate-document.ts';
import { validateProject } from './validate-project.ts';

export function parseProjectText(text: string, options: MigrateOptions = {}): ParseOutcome {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  if (body.trim() === '') return { ok: false, errors: ['the file is empty (no JSON at all)'] };
  let data: unknown;
  let problem: JsonProblem | null = null;
  try {
    data = JSON.parse(body);
    if (parsedTextSuspect(body, data)) problem = scanJson(body);
  } catch (e) {
    problem = scanJson(body);
    // The scanner accepts what JSON.parse refused: a scanner bug; still report it plainly.
    if (!problem) return { ok: false, errors: [`not valid JSON: ${(e as Error).message}`] };
  }
  if (problem) {
    const { line, column } = lineColumn(body, problem.offset);
    const where = `line ${line}, column ${column}`;
    const msg = problem.truncated
      ? `the file is truncated: it ends at ${where} in the middle of the JSON (${problem.problem})`
      : `not valid JSON at ${where}: ${problem.problem}`;
    return { ok: false, errors: [msg] };
  }
  return validateProject(data, options);
}
