import { describe, expect, it } from 'vitest';
import type { AreaLoadSpec, PanelSpec, ProjectFile } from '../../../solver/index.ts';
import { solveProject } from '../../../solver/index.ts';
import { panelShares } from '../../../solver/loads/panel-geometry.ts';
import { createPanelPressureLoad, pressureCoefficientOf } from '../../../solver/loads/panel-loads.ts';

const sum3 = (v: Float64Array, n: number) => [0, 1, 2].map((d) => { let s = 0; for (let k = 0; k < n; k++) s += v[3 * k + d]; return s; });

describe('panel tributary shares (solver/loads/panel-geometry.ts)', () => {
  it('a flat rectangle gives a quarter of its area to each corner, normal up for a counter-clockwise loop', () => {
    const x = new Float64Array([0, 0, 0, 3, 0, 0, 3, 2, 0, 0, 2, 0]);
    const out = new Float64Array(12);
    expect(panelShares(x, [0, 1, 2, 3], 'vector', out)).toBeCloseTo(6, 12);
    for (let k = 0; k < 4; k++) expect([out[3 * k], out[3 * k + 1], out[3 * k + 2]]).toEqual([0, 0, 1.5]);
  });

  it('Σ shares = the area as defined: plan projection, true area, vector area (geometry of a skew quad)', () => {
    // A non-planar (hypar) quad: plan 4 × 3 m, corners raised 0, 1, 0, 1 m.
    const x = new Float64Array([0, 0, 0, 4, 0, 1, 4, 3, 0, 0, 3, 1]);
    const out = new Float64Array(12);
    panelShares(x, [0, 1, 2, 3], 'plan', out);
    expect(sum3(out, 4)[2]).toBeCloseTo(12, 12); // plan area 4 × 3
    // vector area ½ Σ x_k × x_{k+1} of the loop (independent of the fan centre)
    const a = [0, 0, 0];
    for (let k = 0; k < 4; k++) {
      const p = [x[3 * k], x[3 * k + 1], x[3 * k + 2]], q = [x[3 * ((k + 1) % 4)], x[3 * ((k + 1) % 4) + 1], x[3 * ((k + 1) % 4) + 2]];
      a[0] += 0.5 * (p[1] * q[2] - p[2] * q[1]); a[1] += 0.5 * (p[2] * q[0] - p[0] * q[2]); a[2] += 0.5 * (p[0] * q[1] - p[1] * q[0]);
    }
    panelShares(x, [0, 1, 2, 3], 'vector', out);
    sum3(out, 4).forEach((s, d) => expect(s).toBeCloseTo(a[d], 12));
    // true area of the four fan triangles from the centre (2, 1.5, 0.5): each triangle by Heron-free cross product
    const c = [2, 1.5, 0.5];
    let area = 0;
    for (let k = 0; k < 4; k++) {
      const u = [0, 1, 2].map((d) => x[3 * k + d] - c[d]), v = [0, 1, 2].map((d) => x[3 * ((k + 1) % 4) + d] - c[d]);
      area += 0.5 * Math.hypot(u[1] * v[2] - u[2] * v[1], u[2] * v[0] - u[0] * v[2], u[0] * v[1] - u[1] * v[0]);
    }
    panelShares(x, [0, 1, 2, 3], 'true', out);
    expect(sum3(out, 4)[2]).toBeCloseTo(area, 12);
    expect(area).toBeGreaterThan(12);
  });
});

/** Unit cube as 6 quad panels with outward normals (8 nodes). */
const CUBE_X = [0, 0, 0, 1, 0, 0, 1, 1, 0, 0, 1, 0, 0, 0, 1, 1, 0, 1, 1, 1, 1, 0, 1, 1];
const CUBE_FACES = [[0, 3, 2, 1], [4, 5, 6, 7], [0, 1, 5, 4], [1, 2, 6, 5], [2, 3, 7, 6], [3, 0, 4, 7]];

/** Enclosed volume of the fan triangulation (divergence theorem: V = Σ det(c, x_k, x_{k+1}) / 6). */
function fanVolume(x: ArrayLike<number>): number {
  let v = 0;
  for (const f of CUBE_FACES) {
    const c = [0, 1, 2].map((d) => f.reduce((s, i) => s + x[3 * i + d], 0) / f.length);
    for (let k = 0; k < f.length; k++) {
      const p = [0, 1, 2].map((d) => x[3 * f[k] + d]), q = [0, 1, 2].map((d) => x[3 * f[(k + 1) % f.length] + d]);
      v += (c[0] * (p[1] * q[2] - p[2] * q[1]) - c[1] * (p[0] * q[2] - p[2] * q[0]) + c[2] * (p[0] * q[1] - p[1] * q[0])) / 6;
    }
  }
  return v;
}

describe('panel pressure: a follower load that is work-consistent', () => {
  const panels = CUBE_FACES.map((f, i) => ({ spec: { id: `F${i}`, nodes: f.map(String) } as PanelSpec, nodes: new Int32Array(f) }));
  const load: AreaLoadSpec = { kind: 'pressure', value: 1500 };
  const pressure = createPanelPressureLoad(panels, [load])!;

  it('on a closed surface F = −p ∇V: virtual work equals −p ΔV by central differences (divergence theorem)', () => {
    expect(fanVolume(CUBE_X)).toBeCloseTo(1, 14);
    let seed = 7;
    const rnd = () => { seed = (seed * 16807) % 2147483647; return seed / 2147483647 - 0.5; };
    const x = new Float64Array(CUBE_X.map((c) => c + 0.2 * rnd())); // a distorted (non-planar faces) cube
    const dir = new Float64Array(24).map(() => rnd());
    const f = new Float64Array(24);
    pressure.accumulate(x, 1, f);
    const work = f.reduce((s, fi, i) => s + fi * dir[i], 0);
    const h = 1e-5;
    const xp = x.map((c, i) => c + h * dir[i]), xm = x.map((c, i) => c - h * dir[i]);
    const dV = (fanVolume(xp) - fanVolume(xm)) / (2 * h);
    expect(Math.abs(work - -1500 * dV)).toBeLessThan(1e-7 * Math.abs(work) + 1e-9);
    // and a uniform pressure on a closed surface has no resultant
    sum3(f, 8).forEach((s) => expect(Math.abs(s)).toBeLessThan(1e-9));
  });

  it('the load follows the panel: rotating the geometry rotates the forces', () => {
    const f0 = new Float64Array(24), f1 = new Float64Array(24);
    const x = new Float64Array(CUBE_X);
    pressure.accumulate(x, 1, f0);
    const xr = new Float64Array(24);
    for (let i = 0; i < 8; i++) { xr[3 * i] = -x[3 * i + 1]; xr[3 * i + 1] = x[3 * i]; xr[3 * i + 2] = x[3 * i + 2]; } // 90° about z
    pressure.accumulate(xr, 1, f1);
    for (let i = 0; i < 8; i++) {
      expect(f1[3 * i]).toBeCloseTo(-f0[3 * i + 1], 9);
      expect(f1[3 * i + 1]).toBeCloseTo(f0[3 * i], 9);
    }
  });

  it('c_p by panel id wins over c_p by region; default 1', () => {
    const l: AreaLoadSpec = { kind: 'pressure', value: 1, coefficients: [{ region: 'roof', cp: -0.8 }, { region: 'P2', cp: 0.4 }] };
    expect(pressureCoefficientOf(l, { id: 'P1', nodes: [], region: 'roof' })).toBe(-0.8);
    expect(pressureCoefficientOf(l, { id: 'P2', nodes: [], region: 'roof' })).toBe(0.4);
    expect(pressureCoefficientOf(l, { id: 'P3', nodes: [] })).toBe(1);
  });
});

/**
 * A strip of two parallel cables (y = 0 and y = b), n one-element members each, joined by n quad
 * panels; nodes are held in y so each cable carries half the strip. Ends pinned.
 */
function strip(n: number, L: number, b: number, H0: number, areaLoads: AreaLoadSpec[]): ProjectFile {
  const nodes: ProjectFile['nodes'] = [], members: ProjectFile['members'] = [], panels: PanelSpec[] = [];
  for (const [side, y] of [['A', 0], ['B', b]] as const) {
    for (let k = 0; k <= n; k++) nodes.push({ id: `${side}${k}`, at: [(k * L) / n, y, 0], fixed: k === 0 || k === n ? 'xyz' : 'y' });
    for (let k = 0; k < n; k++) members.push({ id: `${side}c${k}`, kind: 'cable', from: `${side}${k}`, to: `${side}${k + 1}`, section: 's', pretension: H0 });
  }
  for (let k = 0; k < n; k++) panels.push({ id: `P${k}`, nodes: [`A${k}`, `A${k + 1}`, `B${k + 1}`, `B${k}`] });
  return {
    format: 'stayset-project', version: 1, nodes, members, panels,
    sections: [{ id: 's', E: 1.5e11, area: 1.5e-4 }],
    loadCases: [{ id: 'load', selfWeight: false, areaLoads }],
  };
}

describe('a pretensioned cable strip under area loads (closed forms)', () => {
  const n = 8, L = 16, b = 2, H0 = 20e3;
  const mid = (c: ReturnType<typeof solveProject>['report']['cases'][number]) => c.nodes.find((x) => x.id === `A${n / 2}`)!;

  it('snow per plan area: Σ support reactions = s × plan area; H = w L²/(8 f) (parabolic cable under uniform load)', () => {
    const s = 1000, w = (s * b) / 2;
    const c = solveProject(strip(n, L, b, H0, [{ kind: 'snow', value: s }])).report.cases[0];
    expect(c.converged).toBe(true);
    const sumFz = c.reactions.reduce((t, r) => t + r.force[2], 0);
    expect(sumFz).toBeCloseTo(s * L * b, 6);
    const f = -mid(c).displacement[2];
    const end = c.reactions.find((r) => r.node === 'A0')!;
    const H = -end.force[0];
    // Equal loads at equally spaced nodes put the nodes on the parabola exactly (funicular polygon);
    // the elastic stretch moves the nodes along x by O(strain) (strain here ≈ 0.2 %), hence 0.3 %.
    expect(Math.abs(H - (w * L * L) / (8 * f)) / H).toBeLessThan(3e-3);
    // The sag that solves both H = wL²/(8f) and the taut-cable elastic law
    // H = H0 + EA · ΔL/L with the polygon's ΔL = (8f²/3L)(1 − 1/n²) (shallow-cable theory, Irvine 1981 ch. 2).
    const EA = 1.5e11 * 1.5e-4;
    let lo = 1e-3, hi = 5;
    for (let i = 0; i < 200; i++) { const m = 0.5 * (lo + hi); if ((w * L * L) / (8 * m) > H0 + (EA * 8 * m * m * (1 - 1 / (n * n))) / (3 * L * L)) lo = m; else hi = m; }
    expect(Math.abs(f - lo) / lo).toBeLessThan(2e-3);
  });

  it('cladding per true area on a flat strip equals snow per plan area', () => {
    const a = solveProject(strip(n, L, b, H0, [{ kind: 'snow', value: 700 }])).report.cases[0];
    const c = solveProject(strip(n, L, b, H0, [{ kind: 'cladding', value: 700 }])).report.cases[0];
    expect(mid(c).displacement[2]).toBeCloseTo(mid(a).displacement[2], 12);
  });

  it('pressure normal to the deformed strip: uniform tension T = w R cos(φ/2) on a circular arc (membrane under normal pressure)', () => {
    // Suction (negative) on panels whose normal points up lifts the strip.
    const p = -1000, w = (-p * b) / 2;
    const c = solveProject(strip(n, L, b, H0, [{ kind: 'pressure', value: p }])).report.cases[0];
    expect(c.converged).toBe(true);
    expect(mid(c).displacement[2]).toBeGreaterThan(0);
    const T = c.members.filter((m) => m.id.startsWith('Ac')).map((m) => m.tensionMax);
    // no load along the cable: one tension throughout
    for (const t of T) expect(Math.abs(t - T[0]) / T[0]).toBeLessThan(1e-9);
    // Nodes of a cable under normal pressure lie on a circle: chord l, turning angle φ, R = l / (2 sin(φ/2)).
    const pos = (k: number) => c.nodes.find((x) => x.id === `A${k}`)!.position;
    const seg = (k: number) => [0, 2].map((d) => pos(k + 1)[d] - pos(k)[d]);
    const l = Math.hypot(...seg(3));
    const a1 = Math.atan2(seg(3)[1], seg(3)[0]), a2 = Math.atan2(seg(4)[1], seg(4)[0]);
    const phi = Math.abs(a2 - a1);
    const R = l / (2 * Math.sin(phi / 2));
    expect(Math.abs(T[0] - w * R * Math.cos(phi / 2)) / T[0]).toBeLessThan(1e-8);
    // every segment has the same length (a regular polygon on the arc)
    for (let k = 0; k < n; k++) expect(Math.hypot(...seg(k))).toBeCloseTo(l, 9);
    // shallow arc ≈ parabola: H = wL²/(8f) within the shallow-cable approximation (f/L ≈ 3 %)
    const f = mid(c).displacement[2];
    const H = -c.reactions.find((r) => r.node === 'A0')!.force[0];
    expect(Math.abs(H - (w * L * L) / (8 * f)) / H).toBeLessThan(1e-2);
  });

  it('a combination scales the pressure (factor 2 = twice the pressure)', () => {
    const p = strip(n, L, b, H0, [{ kind: 'pressure', value: -500 }]);
    p.loadCases.push({ id: 'double', selfWeight: false, areaLoads: [{ kind: 'pressure', value: -1000 }] });
    p.combinations = [{ id: '2x', factors: [{ case: 'load', factor: 2 }] }];
    const r = solveProject(p).report;
    expect(mid(r.cases[2]).displacement[2]).toBeCloseTo(mid(r.cases[1]).displacement[2], 9);
  });
});
