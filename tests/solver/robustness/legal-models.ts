/**
 * Legal models that once stalled or could stall the solver: low or zero pretension, cables much
 * longer than their chord, single and multi-segment, built from the demos and by hand. Invented
 * test structures, not designs. Each names the load cases to run (no wind or area loads: the
 * balance check needs the applied loads known independently of the solver).
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { MemberSpec, ProjectFile, SectionSpec } from '../../../solver/index.ts';

export interface LegalModel { name: string; project: ProjectFile; cases: string[] }

const STRAND: SectionSpec = { id: 'strand', E: 160e9, area: 1.5e-4, massPerLength: 1.2, thermalExpansion: 1.2e-5, diameter: 0.016 };
const ROD: SectionSpec = { id: 'rod', E: 200e9, area: 2e-3, massPerLength: 16 };

function demo(name: string): ProjectFile {
  return JSON.parse(readFileSync(fileURLToPath(new URL(`../../../assets/${name}`, import.meta.url)), 'utf8')) as ProjectFile;
}

function chord(p: ProjectFile, m: MemberSpec): number {
  const a = p.nodes.find((n) => n.id === m.from)!.at, b = p.nodes.find((n) => n.id === m.to)!.at;
  return Math.hypot(b[0] - a[0], b[1] - a[1], b[2] - a[2]);
}

/** The demo mast with every guy of `group` set by pretension P or by unstressed length k × chord. */
function mastWithGuys(group: string, by: { pretension: number } | { lengthFactor: number }): ProjectFile {
  const p = demo('demo-mast.stayset');
  const ids = new Set(p.groups!.find((g) => g.id === group)!.members);
  for (const m of p.members) {
    if (!ids.has(m.id)) continue;
    delete m.pretension;
    delete m.unstressedLength;
    if ('pretension' in by) m.pretension = by.pretension;
    else m.unstressedLength = by.lengthFactor * chord(p, m);
  }
  return p;
}

/** One cable between pins, A at the origin and B at `b`. */
function cable(b: [number, number, number], member: Partial<MemberSpec>, section = STRAND, loads: ProjectFile['loadCases'] = [{ id: 'dead' }]): ProjectFile {
  return {
    format: 'stayset-project', version: 2,
    nodes: [{ id: 'A', at: [0, 0, 0], fixed: 'xyz' }, { id: 'B', at: b, fixed: 'xyz' }],
    sections: [section],
    members: [{ id: 'C', kind: 'cable', from: 'A', to: 'B', section: section.id, ...member }],
    loadCases: loads,
  };
}

/** A pin-ended pole (bar) of height h held at its top by three guys of `segments` elements. */
function guyedPole(guy: Partial<MemberSpec>, segments: number, topLoad: [number, number, number]): ProjectFile {
  const h = 20, r = 15;
  const anchors = [0, 1, 2].map((k) => [r * Math.cos((2 * Math.PI * k) / 3), r * Math.sin((2 * Math.PI * k) / 3), 0] as [number, number, number]);
  const project: ProjectFile = {
    format: 'stayset-project', version: 2,
    nodes: [
      { id: 'BASE', at: [0, 0, 0], fixed: 'xyz' }, { id: 'TOP', at: [0, 0, h], mass: 40 },
      ...anchors.map((at, k) => ({ id: `A${k + 1}`, at, fixed: 'xyz' })),
    ],
    sections: [STRAND, ROD],
    members: [
      { id: 'POLE', kind: 'bar', from: 'BASE', to: 'TOP', section: 'rod' },
      ...anchors.map((_, k): MemberSpec => ({ id: `G${k + 1}`, kind: 'cable', from: `A${k + 1}`, to: 'TOP', section: 'strand', segments, ...guy })),
    ],
    loadCases: [{ id: 'dead' }, { id: 'push', nodalLoads: [{ node: 'TOP', force: topLoad }] }],
  };
  if (guy.unstressedLength !== undefined) {
    for (const m of project.members) if (m.kind === 'cable') m.unstressedLength = guy.unstressedLength * chord(project, m);
  }
  return project;
}

/** Two cables A–M–B with a load at the joint M (free), weightless or not. */
function loadedJoint(factor: number, massPerLength: number, segments: number): ProjectFile {
  const p: ProjectFile = {
    format: 'stayset-project', version: 2,
    nodes: [{ id: 'A', at: [0, 0, 0], fixed: 'xyz' }, { id: 'M', at: [10, 0, -1] }, { id: 'B', at: [20, 0, 0], fixed: 'xyz' }],
    sections: [{ ...STRAND, massPerLength }],
    members: [
      { id: 'C1', kind: 'cable', from: 'A', to: 'M', section: 'strand', segments },
      { id: 'C2', kind: 'cable', from: 'M', to: 'B', section: 'strand', segments },
    ],
    loadCases: [{ id: 'load', nodalLoads: [{ node: 'M', force: [500, 200, -5000] }] }],
  };
  for (const m of p.members) m.unstressedLength = factor * chord(p, m);
  return p;
}

export function legalModels(): LegalModel[] {
  const models: LegalModel[] = [];
  // Default: the cases whose loads the balance test counts (weight and nodal loads: no wind, area loads or ice).
  const add = (name: string, project: ProjectFile, cases = project.loadCases.filter((c) => !c.wind && !c.areaLoads && !c.ice).map((c) => c.id)) => models.push({ name, project, cases });

  // README sample cable (inclined, 20 segments) by pretension, from zero to well above its weight.
  for (const P of [0, 0.01, 1, 100, 1e3, 1e4]) add(`inclined cable, pretension ${P} N`, cable([40, 0, 30], { segments: 20, pretension: P }));
  // Unstressed length 1.0–2 × chord, inclined and level, multi-segment.
  const inclined = Math.hypot(40, 30);
  for (const k of [1.0, 1.001, 1.01, 1.1, 1.5, 2.0]) add(`inclined cable, L0 = ${k} × chord`, cable([40, 0, 30], { segments: 20, unstressedLength: k * inclined }));
  for (const k of [1.05, 2.0]) add(`level cable of 50 segments, L0 = ${k} × chord`, cable([60, 0, 0], { segments: 50, unstressedLength: k * 60 }));
  // Single-segment cables: slack (longer than the chord) and taut, with a temperature case.
  add('single-segment slack cable', cable([30, 0, 10], { unstressedLength: 1.5 * Math.hypot(30, 10) }, STRAND, [{ id: 'dead' }, { id: 'hot', temperatureChange: 40 }]));
  add('single-segment cable, 0.01 N', cable([30, 0, 10], { pretension: 0.01 }, STRAND, [{ id: 'dead' }, { id: 'cold', temperatureChange: -30 }]));
  // Nearly vertical cable.
  add('near-vertical cable, 1 N', cable([0.5, 0, 40], { segments: 10, pretension: 1 }));
  // Guyed pole: guys from 0.01 N to 1 kN, and by length 1.0 and 1.01 × chord, single and multi-segment.
  for (const P of [0.01, 1, 100, 1e3]) add(`guyed pole, guys ${P} N, 8 segments`, guyedPole({ pretension: P }, 8, [2e3, 500, 0]));
  // Single-segment guys at 1 N cannot hold a weighted pole (they go slack: an inverted pendulum,
  // reported as a limit point), but they carry a lateral load without weight.
  const straightGuys = guyedPole({ pretension: 1 }, 1, [2e3, 500, 0]);
  straightGuys.loadCases = [{ id: 'push', selfWeight: false, nodalLoads: [{ node: 'TOP', force: [2e3, 500, 0] }] }];
  add('guyed pole, guys 1 N, single segment, lateral load', straightGuys);
  for (const k of [1.0, 1.01]) add(`guyed pole, guys L0 = ${k} × chord`, guyedPole({ unstressedLength: k }, 8, [2e3, 500, 0]));
  // Loaded joint between two cables (funicular), weightless and with weight, long and short.
  add('loaded joint, weightless, L0 = chord', loadedJoint(1.0, 0, 1));
  add('loaded joint, weightless, 1.2 × chord, single segment', loadedJoint(1.2, 0, 1));
  add('loaded joint, 1.2 × chord, 6 segments', loadedJoint(1.2, 1.2, 6));
  // Demo mast: top guys from 0.01 N to 1 kN (1, 100 and 300 N once reported a limit point).
  for (const P of [0.01, 1, 100, 300, 1e3]) add(`demo mast, top guys ${P} N`, mastWithGuys('mast/guys level 3', { pretension: P }), ['dead']);
  add('demo mast, bottom guys 1 N', mastWithGuys('mast/guys level 1', { pretension: 1 }), ['dead']);
  add('demo mast, top guys L0 = chord', mastWithGuys('mast/guys level 3', { lengthFactor: 1.0 }), ['dead']);
  add('demo mast, middle guys L0 = 1.002 × chord', mastWithGuys('mast/guys level 2', { lengthFactor: 1.002 }), ['dead']);
  add('demo mast as delivered', demo('demo-mast.stayset'));
  add('demo canopy as delivered', demo('demo-canopy.stayset'));
  return models;
}
