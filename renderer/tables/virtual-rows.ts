/**
 * Windowing for long tables (20,000 members): only the rows in view (plus a margin) are in the
 * DOM. Fixed row height, px.
 */
export interface RowWindow {
  first: number;
  last: number; // exclusive
  padTop: number;
  padBottom: number;
}

export function rowWindow(scrollTop: number, viewHeight: number, rowHeight: number, rowCount: number, margin = 10): RowWindow {
  const first = Math.max(0, Math.floor(scrollTop / rowHeight) - margin);
  const last = Math.min(rowCount, Math.ceil((scrollTop + viewHeight) / rowHeight) + margin);
  return { first, last: Math.max(first, last), padTop: first * rowHeight, padBottom: Math.max(0, (rowCount - last) * rowHeight) };
}

/**
 * Scroll position (px) that brings row `index` into a windowed table's view, a third of the way
 * down, or null when the row is already comfortably visible.
 */
export function scrollTopToShow(index: number, rowHeight: number, scrollTop: number, viewHeight: number): number | null {
  const top = index * rowHeight;
  if (top >= scrollTop && top <= scrollTop + viewHeight - 2 * rowHeight) return null;
  return Math.max(0, top - viewHeight / 3);
}
