/**
 * Line drawings of the model for the printed report, as inline SVG: orthographic elevation (x–z)
 * and plan (x–y), both at one scale with a scale bar. The model as entered is drawn thin grey
 * (member chords between their end nodes); over it, when a solved case is given, its deformed
 * shape in black with the node displacements magnified by the factor printed on the drawing
 * (chosen so the largest displacement reads as about 4 % of the model's size; 1 when that is
 * already visible). Bars thick, cables thin, supports as small squares. Pure; coordinates in m.
 */
import type { NodeResult, ProjectFile, Vec3 } from '../../../solver/index.ts';
import { fromDisplay, toDisplay, unitLabel, type UnitSystem } from '../units/index.ts';

export interface DeformedShape {
  caseId: string;
  nodes: NodeResult[];
}

/** Drawing coordinates (horizontal, vertical on the sheet), m, of a point. */
type Projection = (p: Vec3) => [number, number];

/** A round magnification (1, 2, 5 × 10^k, at least 1) that makes `maxDisplacement` about `share` of `size`. */
export function magnification(maxDisplacement: number, size: number, share = 0.04): number {
  if (!(maxDisplacement > 0) || !(size > 0)) return 1;
  const raw = (share * size) / maxDisplacement;
  if (raw <= 1) return 1;
  const p = 10 ** Math.floor(Math.log10(raw));
  return [1, 2, 5, 10].map((k) => k * p).filter((v) => v <= raw).at(-1)!;
}

/** A round scale-bar length (1, 2, 5 × 10^k m) near a fifth of `span`. */
function barLength(span: number): number {
  const raw = span / 5;
  const p = 10 ** Math.floor(Math.log10(raw));
  return [1, 2, 5, 10].map((k) => k * p).filter((v) => v <= raw).at(-1)!;
}

function view(project: ProjectFile, proj: Projection, title: string, width: number, height: number, scale: number, origin: [number, number], deformed: Map<string, Vec3> | null): string {
  const pad = 12;
  const X = (v: number) => (pad + (v - origin[0]) * scale).toFixed(1);
  const Y = (v: number) => (height - pad - 10 - (v - origin[1]) * scale).toFixed(1);
  const at = new Map(project.nodes.map((n) => [n.id, n.at]));
  const draw = (pos: Map<string, Vec3>, colour: string, thin: number, thick: number) => project.members.map((m) => {
    const a = proj(pos.get(m.from)!), b = proj(pos.get(m.to)!);
    return `<line x1="${X(a[0])}" y1="${Y(a[1])}" x2="${X(b[0])}" y2="${Y(b[1])}" stroke="${colour}" stroke-width="${m.kind === 'cable' ? thin : thick}"/>`;
  }).join('');
  const asEntered = draw(at, deformed ? '#999' : '#000', deformed ? 0.4 : 0.5, deformed ? 0.8 : 1.2);
  const shape = deformed ? draw(deformed, '#000', 0.6, 1.2) : '';
  const supports = project.nodes.filter((n) => n.fixed).map((n) => {
    const q = proj(n.at);
    return `<rect x="${(Number(X(q[0])) - 2).toFixed(1)}" y="${(Number(Y(q[1])) - 2).toFixed(1)}" width="4" height="4" fill="#000"/>`;
  }).join('');
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" role="img" aria-label="${title}"><text x="4" y="11" font-size="9" font-family="sans-serif">${title}</text>${asEntered}${shape}${supports}</svg>`;
}

/**
 * Elevation and plan side by side, each `size` px square, at one common scale. With `deformed`,
 * the case's deformed shape is drawn over the model as entered and the caption names the case and
 * the magnification. The scale bar is a round length in the display unit of lengths (m / ft).
 */
export function modelSvg(project: ProjectFile, size = 300, deformed: DeformedShape | null = null, units: UnitSystem = 'SI'): string {
  let moved: Map<string, Vec3> | null = null;
  let factor = 1;
  // Elevation: the vertical plane through x, or — with a deformed shape — through the direction of
  // the largest horizontal displacement, so the sway is seen side on.
  let azimuth = 0;
  if (deformed) {
    const byId = new Map(deformed.nodes.map((n) => [n.id, n.displacement]));
    const sway = deformed.nodes.reduce((best, n) => (Math.hypot(n.displacement[0], n.displacement[1]) > Math.hypot(best[0], best[1]) ? n.displacement : best), [0, 0, 0] as Vec3);
    if (Math.hypot(sway[0], sway[1]) > 0) azimuth = Math.atan2(sway[1], sway[0]);
    const xs0 = project.nodes.map((n) => n.at);
    const span0 = Math.max(...[0, 1, 2].map((k) => Math.max(...xs0.map((p) => p[k])) - Math.min(...xs0.map((p) => p[k]))), 1e-9);
    factor = magnification(Math.max(0, ...deformed.nodes.map((n) => Math.hypot(...n.displacement))), span0);
    moved = new Map(project.nodes.map((n) => {
      const d = byId.get(n.id) ?? [0, 0, 0];
      return [n.id, [n.at[0] + factor * d[0], n.at[1] + factor * d[1], n.at[2] + factor * d[2]] as Vec3];
    }));
  }
  const c = Math.cos(azimuth), sn = Math.sin(azimuth);
  const elevation: Projection = (p) => [p[0] * c + p[1] * sn, p[2]];
  const plan: Projection = (p) => [p[0], p[1]];
  const points = [...project.nodes.map((n) => n.at), ...(moved ? moved.values() : [])];
  const extent = (proj: Projection) => {
    const q = points.map(proj);
    const lo: [number, number] = [Math.min(...q.map((v) => v[0])), Math.min(...q.map((v) => v[1]))];
    return { lo, w: Math.max(...q.map((v) => v[0])) - lo[0], h: Math.max(...q.map((v) => v[1])) - lo[1] };
  };
  const ev = extent(elevation), pv = extent(plan);
  const pad = 12;
  // One scale for both views: the most constraining extent fills its box.
  const scale = Math.min((size - 2 * pad) / Math.max(ev.w, pv.w, 1e-9), (size - 2 * pad - 22) / Math.max(ev.h, pv.h, 1e-9));
  const span = Math.max(ev.w, ev.h, pv.w, pv.h, 1e-9);
  const bar = barLength(toDisplay(span, 'length', units));
  const barPx = fromDisplay(bar, 'length', units) * scale;
  const scaleBar = `<svg xmlns="http://www.w3.org/2000/svg" width="${(barPx + 60).toFixed(0)}" height="16" role="img" aria-label="scale bar"><line x1="2" y1="8" x2="${(2 + barPx).toFixed(1)}" y2="8" stroke="#000" stroke-width="1.5"/><line x1="2" y1="4" x2="2" y2="12" stroke="#000"/><line x1="${(2 + barPx).toFixed(1)}" y1="4" x2="${(2 + barPx).toFixed(1)}" y2="12" stroke="#000"/><text x="${(6 + barPx).toFixed(1)}" y="11" font-size="9" font-family="sans-serif">${bar} ${unitLabel('length', units)}</text></svg>`;
  const deg = Math.round((azimuth * 180) / Math.PI);
  const elevationTitle = deg === 0 ? 'Elevation (x–z)' : `Elevation in the vertical plane at ${deg}° from x`;
  const caption = deformed
    ? `<p class="fig">Orthographic elevation and plan at one scale. Grey: the model as entered; black: the deformed shape of case "${escapeXml(deformed.caseId)}"${factor === 1 ? ' (displacements at true scale)' : `, displacements × ${factor}`}. Members drawn as chords between their end nodes.</p>`
    : '<p class="fig">Orthographic elevation and plan at one scale; members drawn as chords between their end nodes.</p>';
  return `<div class="views">${view(project, elevation, elevationTitle, size, size, scale, ev.lo, moved)}${view(project, plan, 'Plan (x–y)', size, size, scale, pv.lo, moved)}</div>${scaleBar}${caption}`;
}

function escapeXml(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}
