/**
 * Colours of the 3D view and its legend. The tension scale runs teal → amber → crimson over
 * [min, max]; slack and compression have their own colours that are not on the scale, so a slack
 * member is never mistaken for a lightly loaded one. RGB components are 0..1 (sRGB).
 */
export type Rgb = [number, number, number];

/** Stops of the tension scale at t = 0, 0.5, 1. */
export const TENSION_STOPS: readonly Rgb[] = [
  [0.09, 0.62, 0.6], // teal
  [0.95, 0.73, 0.2], // amber
  [0.82, 0.12, 0.2], // crimson
];
export const SLACK_COLOUR: Rgb = [0.78, 0.33, 1.0]; // violet, drawn dashed
export const COMPRESSION_COLOUR: Rgb = [0.2, 0.45, 0.9]; // blue (bars only)
export const UNANALYSED_CABLE: Rgb = [0.62, 0.66, 0.74];
export const UNANALYSED_BAR: Rgb = [0.42, 0.47, 0.56];
/** Beam-columns before analysis: a warm grey, apart from bars and cables. */
export const UNANALYSED_BEAM: Rgb = [0.55, 0.45, 0.32];
export const SELECTED_COLOUR: Rgb = [1.0, 1.0, 1.0];
/** "Checks" colour mode: members (and nodes) that fail a design check, pass, or are not checked. */
export const CHECK_FAIL_COLOUR: Rgb = [1.0, 0.23, 0.19]; // signal red
export const CHECK_PASS_COLOUR: Rgb = [0.3, 0.66, 0.42]; // muted green
export const CHECK_UNCHECKED_COLOUR: Rgb = [0.45, 0.5, 0.58]; // grey

/** Check status of a member or node in SceneData (memberCheck / nodeCheck). */
export const CheckState = {
  None: 0,
  Pass: 1,
  Fail: 2,
  Unchecked: 3,
} as const;
export type CheckState = (typeof CheckState)[keyof typeof CheckState];

/** Member drawing state. */
export const MemberState = {
  NotAnalysed: 0,
  Tension: 1,
  Slack: 2,
  Compression: 3,
} as const;
export type MemberState = (typeof MemberState)[keyof typeof MemberState];

/** Colour at t ∈ [0, 1] of the tension scale (piecewise linear between stops). */
export function scaleColour(t: number, out: Rgb = [0, 0, 0]): Rgb {
  const u = Math.min(1, Math.max(0, Number.isFinite(t) ? t : 0)) * (TENSION_STOPS.length - 1);
  const k = Math.min(TENSION_STOPS.length - 2, Math.floor(u));
  const f = u - k;
  const a = TENSION_STOPS[k];
  const b = TENSION_STOPS[k + 1];
  out[0] = a[0] + (b[0] - a[0]) * f;
  out[1] = a[1] + (b[1] - a[1]) * f;
  out[2] = a[2] + (b[2] - a[2]) * f;
  return out;
}

export function cssColour(c: Rgb): string {
  return `rgb(${Math.round(c[0] * 255)}, ${Math.round(c[1] * 255)}, ${Math.round(c[2] * 255)})`;
}

/** CSS linear-gradient of the tension scale, for the legend bar (left = min). */
export function scaleGradientCss(): string {
  return `linear-gradient(to right, ${TENSION_STOPS.map((c) => cssColour(c)).join(', ')})`;
}
