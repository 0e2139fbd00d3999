/**
 * The Stayset project file, format "stayset-project", version 2, as TypeScript types.
 *
 * Conventions (hold for every field below):
 * - SI base units inside the file: m, N, kg, Pa, 1/K, K, s. Temperatures that are absolute
 *   (reference or installation temperatures) are in K; temperature *changes* are in K as well.
 * - Global axes: z is up; gravity is 9.80665 m/s² along −z.
 * - Angles are stored in degrees (a display-friendly exception named at each field).
 * - Forces are positive along the global axes; member tension is positive.
 *
 * The JSON Schema that validates this shape lives in `main/common/project/` (the solver has no
 * runtime dependencies). Keep both in step.
 */

import type { ActionKind, BucklingCurve, CasePurpose, DesignBasis, MemberDesignRule, MinimumTensionRule, SectionShape, TerminationKind, TwistLimit } from './design-basis-types.ts';

export type * from './design-basis-types.ts';
import type { ReportSpec, SiteMeasurementSetSpec, TensioningSequenceSpec } from './site-types.ts';
import type { BeamReleases, NodeSprings, PrescribedDisplacement, NodalMoment } from './structure-types.ts';
import type { ScheduleSpec, TuningRunRecord } from './schedule-types.ts';
import type { AreaLoadSpec, MemberLossSpec, PanelSpec, PatchWindSpec, WindBasisSpec, WindDirectionsSpec, AncillarySpec, IceWithWindSpec, UnbalancedIceSpec } from './actions-types.ts';

export type * from './actions-types.ts';
export type * from './schedule-types.ts';

export type Vec3 = [number, number, number];
export type * from './structure-types.ts';

export interface ProjectFile {
  format: 'stayset-project';
  version: 2;
  meta?: ProjectMeta;
  nodes: NodeSpec[];
  sections: SectionSpec[];
  members: MemberSpec[];
  loadCases: LoadCaseSpec[];
  /** Named sets of members, used by loads, checks, tuning and the schedule. */
  groups?: GroupSpec[];
  /** Factored combinations of load cases; each is solved as its own nonlinear case. */
  combinations?: CombinationSpec[];
  /** Design-check settings and limits. */
  checks?: CheckSettings;
  /** Pretension tuning targets and the variables the tuner may change. */
  tuning?: TuningSpec;
  /** Installation data settings (temperature table). */
  installation?: InstallationSpec;
  /** Parameters of generators that produced parts of this model (for re-running them). */
  generators?: GeneratorRecord[];
  /** Display preferences; never affect results. */
  display?: DisplaySettings;
  /** Check format and factors (design-basis-types.ts); absent = the limit-state defaults. */
  designBasis?: DesignBasis;
  /** Tensioning sequences for the crew (solver/sequence). */
  sequences?: TensioningSequenceSpec[];
  /** Measurements taken on site, for the as-built back-analysis (solver/asbuilt). */
  siteMeasurements?: SiteMeasurementSetSpec[];
  /** Calculation report: document number and revision block. */
  report?: ReportSpec;
  /** Panels carrying area loads (solver/project/actions-types.ts). */
  panels?: PanelSpec[];
  /** Patch wind on guyed masts: a combination of results (actions-types.ts). */
  patchWind?: PatchWindSpec[];
  /** Member loss (guy rupture) accidental cases (actions-types.ts). */
  memberLoss?: MemberLossSpec[];
  /** Wind cases from N directions (actions-types.ts). */
  windDirections?: WindDirectionsSpec[];
  /** Antennas, feeders, ladders, platforms: wind, weight and ice (actions-types.ts). */
  ancillaries?: AncillarySpec[];
  /** What the printed schedule lists (schedule-types.ts); absent = cables only. */
  schedule?: ScheduleSpec;
  /** Ice-with-wind pairings (actions-types.ts). */
  iceWithWind?: IceWithWindSpec[];
  /** Unbalanced ice on guys (actions-types.ts). */
  unbalancedIce?: UnbalancedIceSpec[];
}

export interface ProjectMeta {
  name?: string;
  site?: string;
  client?: string;
  engineer?: string;
  notes?: string;
  /** Design reference temperature, K (the state the model and pretensions describe). */
  referenceTemperature?: number;
}

export interface NodeSpec {
  id: string;
  /** Position [x, y, z], m. */
  at: Vec3;
  /**
   * Restrained directions: translations x, y, z and rotations rx, ry, rz (global axes), each at
   * most once, written together: "xyz" = pinned, "xyzrxryrz" = clamped. Absent = free.
   */
  fixed?: string;
  /** Elastic supports (springs to ground), see NodeSprings. */
  springs?: NodeSprings;
  /** Added lumped mass at the node (equipment, antennas, fittings), kg: weighs with self-weight, vibrates in modes. */
  mass?: number;
}

export interface SectionSpec {
  id: string;
  /** Young's modulus, Pa (for strands, the effective modulus of the strand). */
  E: number;
  /** Metallic cross-section area, m². */
  area: number;
  /** Mass per unit unstressed length, kg/m. Default 0. */
  massPerLength?: number;
  /** Minimum breaking load, N. Needed for utilisation checks. */
  breakingLoad?: number;
  /** Coefficient of thermal expansion, 1/K. Default 0. */
  thermalExpansion?: number;
  /** Outer diameter, m (wind and ice). */
  diameter?: number;
  /** Drag coefficient on the diameter, dimensionless (default: see solver/loads). */
  dragCoefficient?: number;
  /**
   * For members that stand for a lattice mast segment: solidity ratio (0..1) and face width (m);
   * the wind model then uses a lattice drag factor instead of the round-section drag.
   */
  lattice?: {
    faceWidth: number;
    solidity: number;
    /** Force coefficient C_f on the face area; absent = C_f(φ) of solver/loads/lattice-force-coefficient.ts. */
    dragFactor?: number;
    /**
     * Share [0..1] of the whole-mast lattice drag this member line carries; default 1. A
     * triangular mast modelled leg by leg gives each leg 1/3 so the mast drag is counted once;
     * 0 = a member of the lattice (bracing) whose drag the other lines carry: no wind of its own,
     * ice on its diameter.
     */
    share?: number;
    /** Plan of the lattice for the force coefficient C_f(φ); default 'triangular' (solver/loads/lattice-force-coefficient.ts). */
    plan?: 'triangular' | 'square';
    /** Face members flat-sided or round, for C_f(φ) when dragFactor is absent; default 'flat' (the larger C_f). */
    members?: 'flat' | 'round';
    /** Mean width of the face members across the wind, m, for the iced solidity; default the section's diameter. */
    memberWidth?: number;
  };
  label?: string;
  /** Shape, for the buckling-curve and radius-of-gyration defaults. */
  shape?: SectionShape;
  /** Buckling curve (EN 1993-1-1 Table 6.2); default from `shape`. */
  bucklingCurve?: BucklingCurve;
  /** Least radius of gyration, m (default for solid rounds: diameter / 4). */
  radiusOfGyration?: number;
  /** Cable end termination, for its efficiency factor k_e. */
  termination?: TerminationKind;
  /** End-termination efficiency k_e (0..1], overrides `termination`. */
  terminationEfficiency?: number;
  /** Shear modulus, Pa (beams). */
  G?: number;
  /** Second moments of area about the local y and z axes, m⁴ (beams). */
  Iy?: number;
  Iz?: number;
  /** Torsion constant, m⁴ (beams). */
  J?: number;
  /** Yield strength, Pa. */
  yieldStrength?: number;
}

/** cable: tension-only; bar: tension and compression; beam: beam-column (axial, bending, torsion). */
export type MemberKind = 'cable' | 'bar' | 'beam';

export interface MemberSpec {
  id: string;
  kind: MemberKind;
  from: string;
  to: string;
  section: string;
  /** Number of elements the solver splits the member into, 1 to 10,000. Default 1. */
  segments?: number;
  /** Axial force at the modelled geometry, N (positive = tension). Exclusive with unstressedLength. */
  pretension?: number;
  /** Stress-free length of the whole member, m. Exclusive with pretension. */
  unstressedLength?: number;
  /** Group ids this member belongs to (in addition to GroupSpec.members). */
  groups?: string[];
  /** Set by a generator: which generator record made this member. */
  generatedBy?: string;
  /** End-termination efficiency k_e (0..1], overrides the section's. */
  terminationEfficiency?: number;
  /** Buckling length, m, overrides the member design rules. */
  bucklingLength?: number;
  /** Beams: reference vector fixing the local y axis (its part normal to the member); see solver/elements/beam. */
  orientation?: Vec3;
  /** Beams: end releases (pins). */
  releases?: BeamReleases;
}

export interface NodalLoadSpec {
  node: string;
  /** Force [Fx, Fy, Fz], N. */
  force: Vec3;
  /** Moment, N·m (nodes with rotations only). */
  moment?: NodalMoment;
}

export interface WindSpec {
  /**
   * Direction the air flows toward, degrees, measured in the x–y plane counter-clockwise from +x
   * (0 = wind blowing toward +x, 90 = toward +y).
   */
  direction: number;
  /** Mean wind speed at 10 m above z = 0, m/s. */
  speed: number;
  /** Height profile; default a power law with exponent from solver/loads defaults. */
  profile?: WindProfileSpec;
  /** Air density, kg/m³ (default 1.225). */
  airDensity?: number;
  /** Only load these groups (default: every member). */
  groups?: string[];
  /** What `speed` stands for and the factors on the forces (actions-types.ts). */
  basis?: WindBasisSpec;
}

export type WindProfileSpec =
  | { kind: 'power'; exponent: number }
  | { kind: 'log'; roughnessLength: number }
  | { kind: 'uniform' };

export interface IceSpec {
  /** Radial ice thickness, m. */
  thickness: number;
  /** Ice density, kg/m³ (default in solver/loads). */
  density?: number;
  /** Only ice these groups (default: every member with a diameter). */
  groups?: string[];
  /** Members left bare although in the iced groups (unbalanced ice on guys). */
  bareMembers?: string[];
}

export interface LoadCaseSpec {
  id: string;
  label?: string;
  /** Include self-weight of every member. Default true. */
  selfWeight?: boolean;
  /** Uniform temperature change from the reference temperature, K. Default 0. */
  temperatureChange?: number;
  nodalLoads?: NodalLoadSpec[];
  wind?: WindSpec;
  ice?: IceSpec;
  /** What the case is checked for (absent = serviceability). */
  purpose?: CasePurpose;
  /** Which action the case represents, for the combination builder. */
  action?: ActionKind;
  /** Prescribed support displacements in this case. */
  displacements?: PrescribedDisplacement[];
  /** Area loads on panels (actions-types.ts). */
  areaLoads?: AreaLoadSpec[];
}

export interface GroupSpec {
  id: string;
  label?: string;
  members: string[];
}

export interface CombinationSpec {
  id: string;
  label?: string;
  /** Sum of factor × load case; self-weight, nodal loads, wind pressure and ΔT are all scaled. */
  factors: { case: string; factor: number }[];
  /** What the combination is checked for (absent = ultimate). */
  purpose?: CasePurpose;
}

/** Limit on sag: a fraction of the chord length, or an absolute length in m. */
export type SagLimit = { fractionOfSpan: number } | { absolute: number };

export interface CheckSettings {
  /** Member groups (or "*" for all cables) that must not go slack in any case. */
  noSlackGroups?: string[];
  sagLimits?: { group: string; limit: SagLimit }[];
  /** Limit on the displacement of named nodes, m: horizontal (default), total or along a direction. */
  displacementLimits?: { node: string; limit: number; direction?: 'horizontal' | 'total' | Vec3 }[];
  /** Mast tilt: horizontal offset of `top` relative to `base` over their height, as a ratio. */
  tiltLimits?: { base: string; top: string; limit: number }[];
  /** Supports at which uplift (reaction along −z pulling the support up, Fz < 0) is flagged. */
  upliftNodes?: string[];
  /** Minimum tension of cables per group (serviceability cases). */
  minimumTension?: MinimumTensionRule[];
  /** Buckling lengths, roles and slenderness limits of bars per group. */
  memberDesign?: MemberDesignRule[];
  /** Twist (rotation about the vertical) of node sets, degrees. */
  twistLimits?: TwistLimit[];
}

/**
 * Tuning targets. sag: sag ≤ limit in `case`; tensionShare: tension / breaking load = share
 * (fraction, 0..1) at installation (the reference case); noSlack: no member of the group slack in
 * `case`; plumb: horizontal offset of `top` relative to `base` ≤ tolerance (m) in `case`;
 * reaction: magnitude of the support reaction at `node` ≤ limit (N) in `case`.
 */
export type TuningTarget =
  | { kind: 'sag'; group: string; case: string; limit: SagLimit }
  | { kind: 'tensionShare'; group: string; share: number }
  | { kind: 'noSlack'; group: string; case: string }
  | { kind: 'plumb'; base: string; top: string; case: string; tolerance: number }
  | { kind: 'reaction'; node: string; case: string; limit: number };

export interface TuningSpec {
  /**
   * Groups whose pretension the tuner may change, and how: by 'pretension' (one force for every
   * member of the group, N; min/max in N) or by 'unstressedLength' (one factor on the members'
   * unstressed lengths, dimensionless; min/max as factors).
   */
  variables: { group: string; by: 'pretension' | 'unstressedLength'; min?: number; max?: number }[];
  targets: TuningTarget[];
  /** Result of the last tuning run, written by `stayset tune --write`. */
  lastRun?: TuningRunRecord;
}

export interface InstallationSpec {
  /** Installation temperatures for the table, K. Default −20 °C … +40 °C in 5 °C steps. */
  temperatures?: number[];
}

export interface GeneratorRecord {
  id: string;
  kind: 'guyedMast' | 'saddleNet' | 'radialNet';
  params: Record<string, unknown>;
}

export interface DisplaySettings {
  units?: 'SI' | 'US';
  deformationScale?: number;
}
