/**
 * Plain-text tables for terminals and logs: a header row, a dashed rule, columns padded with
 * two spaces; numeric columns right-aligned. Width counts UTF-16 code units (ids are short).
 */
export interface Column {
  title: string;
  align?: 'left' | 'right';
}

export function textTable(columns: readonly Column[], rows: readonly string[][], indent = '  '): string {
  const widths = columns.map((c, j) => Math.max(c.title.length, ...rows.map((r) => (r[j] ?? '').length)));
  const line = (cells: readonly string[]): string =>
    indent +
    cells
      .map((cell, j) => (columns[j].align === 'right' ? cell.padStart(widths[j]) : cell.padEnd(widths[j])))
      .join('  ')
      .trimEnd();
  const rule = indent + widths.map((w) => '-'.repeat(w)).join('  ');
  return [line(columns.map((c) => c.title)), rule, ...rows.map(line)].join('\n');
}
