/**
 * A line drawing of the model as modelled (straight member chords between their end nodes), in
 * elevation (x–z) and plan (x–y), as inline SVG for the printed report. Bars are drawn thick,
 * cables thin, supports as small squares. Pure; coordinates in m scaled to the box.
 */
import type { ProjectFile } from '../../../solver/index.ts';

function view(project: ProjectFile, axes: [0 | 1 | 2, 0 | 1 | 2], title: string, width: number, height: number): string {
  const at = new Map(project.nodes.map((n) => [n.id, n.at]));
  const xs = project.nodes.map((n) => n.at[axes[0]]), ys = project.nodes.map((n) => n.at[axes[1]]);
  const x0 = Math.min(...xs), x1 = Math.max(...xs), y0 = Math.min(...ys), y1 = Math.max(...ys);
  const pad = 12;
  const s = Math.min((width - 2 * pad) / Math.max(x1 - x0, 1e-9), (height - 2 * pad - 12) / Math.max(y1 - y0, 1e-9));
  const X = (v: number) => (pad + (v - x0) * s).toFixed(1);
  const Y = (v: number) => (height - pad - (v - y0) * s).toFixed(1);
  const lines = project.members.map((m) => {
    const a = at.get(m.from)!, b = at.get(m.to)!;
    return `<line x1="${X(a[axes[0]])}" y1="${Y(a[axes[1]])}" x2="${X(b[axes[0]])}" y2="${Y(b[axes[1]])}" stroke="#000" stroke-width="${m.kind === 'bar' ? 1.2 : 0.5}"/>`;
  }).join('');
  const supports = project.nodes.filter((n) => n.fixed).map((n) => `<rect x="${(Number(X(n.at[axes[0]])) - 2).toFixed(1)}" y="${(Number(Y(n.at[axes[1]])) - 2).toFixed(1)}" width="4" height="4" fill="#000"/>`).join('');
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" role="img" aria-label="${title}"><text x="4" y="11" font-size="9" font-family="sans-serif">${title}</text>${lines}${supports}</svg>`;
}

/** Elevation and plan side by side, each `size` px square. */
export function modelSvg(project: ProjectFile, size = 300): string {
  return `<div class="views">${view(project, [0, 2], 'Elevation (x–z)', size, size)}${view(project, [0, 1], 'Plan (x–y)', size, size)}</div>`;
}
