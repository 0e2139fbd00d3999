import type { SolveReport } from '../results/types.ts';
import type { Vec3 } from '../project/types.ts';

/** Extremes of one member over the enveloped cases. Forces N, lengths m. */
export interface MemberEnvelope {
  id: string;
  tensionMax: number;
  tensionMaxCase: string;
  tensionMin: number;
  tensionMinCase: string;
  sagMax: number;
  sagMaxCase: string;
  /** Case ids in which the member is slack anywhere (empty = never slack). */
  slackCases: string[];
}

/** Largest displacement magnitude of one node, m. */
export interface NodeEnvelope {
  id: string;
  displacementMax: number;
  displacementMaxCase: string;
}

/** Per-component extremes over the cases, with the case of each extreme (components x, y, z). */
export interface ComponentExtremes {
  max: Vec3;
  maxCase: [string, string, string];
  min: Vec3;
  minCase: [string, string, string];
}

/** Per-component extremes of one support reaction, N; the case ids are per component x, y, z. */
export interface ReactionEnvelope extends ComponentExtremes {
  node: string;
  /** Largest reaction magnitude and its case. */
  magnitudeMax: number;
  magnitudeMaxCase: string;
  /** Extremes of the support moment, N·m, where the support restrains a rotation in some enveloped case. */
  moment?: ComponentExtremes;
}

const noExtremes = (): ComponentExtremes => ({ max: [-Infinity, -Infinity, -Infinity], maxCase: ['', '', ''], min: [Infinity, Infinity, Infinity], minCase: ['', '', ''] });

function widen(e: ComponentExtremes, v: Vec3, caseId: string): void {
  for (let d = 0; d < 3; d++) {
    if (v[d] > e.max[d]) { e.max[d] = v[d]; e.maxCase[d] = caseId; }
    if (v[d] < e.min[d]) { e.min[d] = v[d]; e.minCase[d] = caseId; }
  }
}

export interface Envelope {
  /** Cases that entered the envelope (converged only), in report order. */
  cases: string[];
  /** Cases left out because they did not converge. */
  skipped: string[];
  members: MemberEnvelope[];
  nodes: NodeEnvelope[];
  reactions: ReactionEnvelope[];
}

/**
 * Envelope over cases and combinations of a SolveReport: per member max/min tension, max sag and
 * slack cases; per node max displacement; per support reaction component extremes (and of its
 * moment where a rotation is restrained). Only converged
 * cases enter; `only` restricts to the given case ids. Ties keep the first case in report order.
 * Members, nodes and supports are listed in the order they first appear in the report.
 */
export function envelopeOf(report: SolveReport, only?: readonly string[]): Envelope {
  const want = only ? new Set(only) : null;
  const env: Envelope = { cases: [], skipped: [], members: [], nodes: [], reactions: [] };
  const mem = new Map<string, MemberEnvelope>();
  const nod = new Map<string, NodeEnvelope>();
  const rea = new Map<string, ReactionEnvelope>();
  for (const c of report.cases) {
    if (want && !want.has(c.id)) continue;
    if (!c.converged) { env.skipped.push(c.id); continue; }
    env.cases.push(c.id);
    for (const m of c.members) {
      let e = mem.get(m.id);
      if (!e) {
        e = { id: m.id, tensionMax: -Infinity, tensionMaxCase: '', tensionMin: Infinity, tensionMinCase: '', sagMax: -Infinity, sagMaxCase: '', slackCases: [] };
        mem.set(m.id, e);
        env.members.push(e);
      }
      if (m.tensionMax > e.tensionMax) { e.tensionMax = m.tensionMax; e.tensionMaxCase = c.id; }
      if (m.tensionMin < e.tensionMin) { e.tensionMin = m.tensionMin; e.tensionMinCase = c.id; }
      if (m.sag > e.sagMax) { e.sagMax = m.sag; e.sagMaxCase = c.id; }
      if (m.slack) e.slackCases.push(c.id);
    }
    for (const n of c.nodes) {
      const d = Math.hypot(n.displacement[0], n.displacement[1], n.displacement[2]);
      let e = nod.get(n.id);
      if (!e) { e = { id: n.id, displacementMax: -Infinity, displacementMaxCase: '' }; nod.set(n.id, e); env.nodes.push(e); }
      if (d > e.displacementMax) { e.displacementMax = d; e.displacementMaxCase = c.id; }
    }
    for (const r of c.reactions) {
      let e = rea.get(r.node);
      if (!e) {
        e = { node: r.node, ...noExtremes(), magnitudeMax: -Infinity, magnitudeMaxCase: '' };
        rea.set(r.node, e);
        env.reactions.push(e);
      }
      widen(e, r.force, c.id);
      if (r.moment) widen(e.moment ??= noExtremes(), r.moment, c.id);
      const mag = Math.hypot(r.force[0], r.force[1], r.force[2]);
      if (mag > e.magnitudeMax) { e.magnitudeMax = mag; e.magnitudeMaxCase = c.id; }
    }
  }
  return env;
}
