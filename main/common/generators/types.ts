import type { GroupSpec, MemberSpec, MessageQuantity, NodeSpec, PanelSpec, SectionSpec } from '../../../solver/index.ts';
import { generatorNote, type GeneratorNote, type GeneratorNoteCode } from './generator-notes.ts';
import { generatorProblemText } from './generator-text.ts';

/**
 * What a generator makes: ordinary, editable project parts.
 *
 * Ownership convention (the file format has `generatedBy` on members only): every node, section
 * and group a generator makes has an id that starts with `<recordId>/`, and every member it makes
 * has `generatedBy = <recordId>` (and the same id prefix). Re-running a generator replaces exactly
 * those parts (see applyGenerated).
 */
export interface GeneratedParts {
  nodes: NodeSpec[];
  sections: SectionSpec[];
  members: MemberSpec[];
  groups: GroupSpec[];
  /** Panels for area loads (nets: one per grid cell), ids starting "<recordId>/". */
  panels?: PanelSpec[];
  /** Notable node ids for the caller (e.g. mast base and top for tilt checks). */
  keyNodes: Record<string, string>;
}

/** Section properties a generator asks for (ids and lattice data are made by the generator). SI units. */
export type SectionInput = Omit<SectionSpec, 'id' | 'lattice'>;

/**
 * A parameter problem: plain words naming the parameter, or a structured note (with the entry in
 * `refs.entry`) when it quotes numbers, worded in the display units by generator-text.ts.
 */
export type GeneratorProblem = string | GeneratorNote;

/** Thrown with every problem of the parameters, each naming the parameter. `message` words them in SI. */
export class GeneratorInputError extends Error {
  constructor(readonly problems: GeneratorProblem[]) {
    super(`Generator parameters are invalid:\n  ${problems.map((p) => generatorProblemText(p, 'SI')).join('\n  ')}`);
    this.name = 'GeneratorInputError';
  }
}

/** Collects parameter problems; `positive('height', v)` etc. */
export class ParamCheck {
  readonly problems: GeneratorProblem[] = [];
  constructor(private readonly prefix: string) {}
  positive(name: string, v: unknown): void {
    if (typeof v !== 'number' || !Number.isFinite(v) || v <= 0) this.problems.push(`${this.prefix}.${name}: ${String(v)} must be a positive number`);
  }
  integer(name: string, v: unknown, min: number, max: number): void {
    if (typeof v !== 'number' || !Number.isInteger(v) || v < min || v > max) this.problems.push(`${this.prefix}.${name}: ${String(v)} must be a whole number from ${min} to ${max}`);
  }
  section(name: string, s: SectionInput | undefined): void {
    if (!s) { this.problems.push(`${this.prefix}.${name}: section properties are missing`); return; }
    this.positive(`${name}.E`, s.E);
    this.positive(`${name}.area`, s.area);
  }
  fail(message: string): void { this.problems.push(`${this.prefix}.${message}`); }
  /** A problem that quotes numbers: a structured note naming parameter `name`. */
  failWith(name: string, code: GeneratorNoteCode, quantities: Record<string, MessageQuantity>): void {
    this.problems.push(generatorNote(code, { entry: `${this.prefix}.${name}` }, quantities));
  }
  throwIfAny(): void { if (this.problems.length) throw new GeneratorInputError(this.problems); }
}

export function sectionSpec(id: string, s: SectionInput, extra: Partial<SectionSpec> = {}): SectionSpec {
  const out: SectionSpec = { id, E: s.E, area: s.area };
  if (s.massPerLength !== undefined) out.massPerLength = s.massPerLength;
  if (s.breakingLoad !== undefined) out.breakingLoad = s.breakingLoad;
  if (s.thermalExpansion !== undefined) out.thermalExpansion = s.thermalExpansion;
  if (s.diameter !== undefined) out.diameter = s.diameter;
  if (s.dragCoefficient !== undefined) out.dragCoefficient = s.dragCoefficient;
  if (s.label !== undefined) out.label = s.label;
  return { ...out, ...extra };
}

/** Round to 1e-6 m so generated coordinates read cleanly in the file. */
export function roundCoord(v: number): number {
  return Math.round(v * 1e6) / 1e6;
}
