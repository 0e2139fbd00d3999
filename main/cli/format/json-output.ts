/**
 * JSON for stdout: two-space indent like JSON.stringify(v, null, 2), but lists of plain numbers
 * (positions, displacements, forces) on one line, so results stay readable and compact.
 */
export function jsonOutput(value: unknown): string {
  const pretty = JSON.stringify(value, null, 2);
  return `${pretty.replace(/\[\n\s*((?:-?[\d.eE+-]+|null)(?:,\n\s*(?:-?[\d.eE+-]+|null))*)\n\s*\]/g, (_m, body: string) => `[${body.split(/,\n\s*/).join(', ')}]`)}\n`;
}
