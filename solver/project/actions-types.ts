/**
 * Project-file types of the design actions: panels with area loads (canopies and nets), patch
 * wind on guyed masts (a combination of results), member loss (guy rupture).
 *
 * Units SI, z up, as in types.ts. The JSON Schema keeps these in the same order
 * (main/common/project/stayset-project.v1.schema.json, checked by a test).
 */

/**
 * A panel: a loop of three or more nodes bounding a piece of surface that carries area loads
 * (snow, wind pressure, cladding weight). The surface is the fan of triangles from the mean of
 * the corners to each edge, so a non-planar loop is allowed. Its normal follows the right-hand
 * rule on the node order (counter-clockwise seen from above = normal pointing up).
 */
export interface PanelSpec {
  id: string;
  /** Corner node ids in order around the loop (≥ 3, no repeats). */
  nodes: string[];
  /** Region name: pressure coefficients may be given per region instead of per panel. */
  region?: string;
  label?: string;
}

/** Pressure coefficient of the panels of one region (or of one panel, by its id). */
export interface PressureCoefficientSpec {
  /** A panel region or a panel id. */
  region: string;
  /** Pressure coefficient c_p (net), dimensionless. */
  cp: number;
}

/**
 * An area load on panels.
 * - snow: `value` per plan area, Pa, acting downward (−z); areas at the modelled geometry.
 * - cladding: weight per true (sloping) area, Pa, acting downward; areas at the modelled geometry.
 * - pressure: net pressure, Pa, normal to the deformed panel (a follower load): positive acts
 *   against the panel normal (pressure on the top face), negative is suction (uplift on a panel
 *   whose normal points up). On each panel it is value × c_p.
 */
export interface AreaLoadSpec {
  kind: 'snow' | 'cladding' | 'pressure';
  value: number;
  /** Only these panels or regions (default: every panel). */
  panels?: string[];
  /** pressure only: c_p per region or panel id (a panel id wins over its region); default c_p = 1. */
  coefficients?: PressureCoefficientSpec[];
}

/**
 * Patch wind on a guyed mast (equivalent static method for guyed masts, EN 1993-3-1 Annex B,
 * B.4.3.2): the mean-wind case S_m plus one patch case S_i per patch — the mean wind everywhere,
 * with the wind force increased inside the patch — combined per result quantity as
 *   S = S_m ± √Σ (S_i − S_m)²      (EN 1993-3-1 B.4.3.2.5(1)).
 * Reported as the patch cases "<id> / patch k" and the two results "<id> max" (S_m + S_p) and
 * "<id> min" (S_m − S_p).
 */
export interface PatchWindSpec {
  id: string;
  label?: string;
  /** The load case with the mean wind on the whole structure. */
  meanCase: string;
  /**
   * Wind force inside a patch as a multiple of the mean wind force there (> 1). No default: the
   * standard derives the patch load from the turbulence intensity (recalled — check your copy).
   */
  patchFactor: number;
  /**
   * Height ranges of the patches, m above z = 0 (an element is in a patch when its mid-height is).
   * Default: the spans between guy levels — base to the first guy level, between adjacent levels,
   * the top guy level to the top — where a guy level is the height of a node at which a cable
   * meets a bar.
   */
  patches?: { from: number; to: number }[];
}

/**
 * Sudden loss of a member (guy rupture): from the solved state of `fromCase`, each listed member
 * is removed in turn (one accidental case each, "<id> / <member>"); the force it exerted on its
 * free end nodes is released with a dynamic amplification factor, and the structure without it is
 * solved nonlinearly under the case loads plus (1 − factor) × that force.
 */
export interface MemberLossSpec {
  id: string;
  label?: string;
  /** Load case or combination whose solved state the loss starts from. */
  fromCase: string;
  /** Members removed, one case each. */
  members?: string[];
  /** Or every member of this group in turn. */
  group?: string;
  /** Dynamic amplification factor on the released force (1 = static, ≤ 2). Default from dampingRatio. */
  dynamicFactor?: number;
  /** Critical damping ratio ζ (0 ≤ ζ < 1) for the default factor 1 + exp(−πζ/√(1−ζ²)); default 0 (factor 2). */
  dampingRatio?: number;
  /** What the cases are checked for; default 'accidental' (checked with the accidental factors). */
  purpose?: 'accidental' | 'ultimate' | 'serviceability';
}

/**
 * What a wind action's speed stands for, and the factors applied to its forces. Velocity pressure
 * q = ½ ρ V(z)²; the wind forces are multiplied by gustFactor × structuralFactor.
 */
export interface WindBasisSpec {
  /** 'mean': `speed` is a mean wind speed; 'peak': a gust (peak) speed. */
  velocity: 'mean' | 'peak';
  /** Averaging period of `speed`, s (600 = 10-minute mean, 3 = 3-second gust). */
  averagingPeriod: number;
  /** Factor on the forces of a mean-velocity pressure to reach a peak (gust) pressure; default 1 (none applied). */
  gustFactor?: number;
  /** Structural factor (e.g. c_s c_d of EN 1991-1-4 §6) on the forces; default 1 (none applied). */
  structuralFactor?: number;
}

/**
 * Wind from `count` directions: the load case `case` (with wind) is solved once per direction
 * azimuth + k · 360°/count (k = 0 … count − 1), as cases "<id> <direction>°".
 */
export interface WindDirectionsSpec {
  id: string;
  label?: string;
  /** Load case with wind whose direction is replaced. */
  case: string;
  /** Number of directions (1 … 72). */
  count: number;
  /** First direction, degrees (same convention as WindSpec.direction); default 0. */
  azimuth?: number;
}

/**
 * An ancillary on the structure (antenna, dish, feeder, ladder, platform): its wind drag, weight
 * and ice. A point item hangs on `node`; a line item (feeder, ladder) runs along the members of
 * `along.group` between two heights and is spread over their nodes by tributary height.
 */
export interface AncillarySpec {
  id: string;
  label?: string;
  kind: 'antenna' | 'dish' | 'feeder' | 'ladder' | 'platform' | 'other';
  /** Point item: the node it is attached at. */
  node?: string;
  /** Line item: the group it runs along and the height range, m above z = 0. */
  along?: { group: string; from: number; to: number };
  /** Drag area C_f · A, m² (point item) or m² per metre of height (line item). */
  dragArea: number;
  /** Mass, kg (point item) or kg per metre of height (line item). */
  mass: number;
  /** Drag area added per metre of radial ice (m²/m; line items per metre of height too); default 0: ice ignored. */
  iceDragArea?: number;
  /** Ice mass per metre of radial ice (kg/m; line items per metre of height too); default 0: ice ignored. */
  iceMass?: number;
  /**
   * How ice forms on the item under a case's radial ice t:
   * - 'perThickness' (default): drag area + iceDragArea · t, mass iceMass · t (both default 0);
   * - 'coat': a uniform coat on a round body of outer width coatWidth (w): the drag area grows by
   *   (w + 2t)/w (same force coefficient) and the ice mass is ρ π t (w + t) per metre of the body —
   *   coatLength metres for a point item, per metre of height for a line item;
   * - 'none': no ice (shielded, e.g. inside a heated radome).
   */
  iceBehaviour?: 'perThickness' | 'coat' | 'none';
  /** 'coat': outer width of the iced body, m. */
  coatWidth?: number;
  /** 'coat', point items: length of the iced body, m. */
  coatLength?: number;
}

/**
 * Ice with wind, as codes pair them: for each pair (ice factor, wind factor), the load case
 * `iceCase` (its self-weight, loads and ice) with the wind of `windCase`, solved as the case
 * "<id> / ice <ice> + wind <wind>". The ice factor scales the radial ice thickness (so the ice
 * weight and the iced wind areas follow it); the wind factor scales the wind pressure (the speed
 * by its square root). The wind acts on the iced areas (cables, lattice faces, ancillaries).
 */
export interface IceWithWindSpec {
  id: string;
  label?: string;
  /** Load case with ice (its wind, if any, is replaced). */
  iceCase: string;
  /** Load case whose wind is taken. */
  windCase: string;
  /**
   * Factor pairs; default [{ ice: 1, wind: 0.5 }, { ice: 0.5, wind: 1 }] — common practice (a
   * dominant action at full value with the other reduced), placeholders: set the factors of the
   * code in force.
   */
  pairs?: { ice: number; wind: number }[];
  /** What the cases are checked for (default: the purpose of iceCase). */
  purpose?: 'ultimate' | 'serviceability' | 'accidental';
}

/**
 * Unbalanced ice on guys: copies of the load case `case` (which has ice) with the guys of `group`
 * iced on some and bare on the others — common practice for guyed masts (the concept of iced and
 * bare spans is recalled from ISO 12494, not read here). Units are single guys (`by: 'guy'`) or
 * guy levels (`by: 'level'`: the guys whose upper end is at one height); for each unit in turn,
 * 'eachBare' leaves that unit bare and the rest iced, 'eachIced' ices that unit only. Cases
 * "<id> / <guy> bare", "<id> / level <z> m iced", …; other members keep the case's ice.
 */
export interface UnbalancedIceSpec {
  id: string;
  label?: string;
  /** Load case with ice. */
  case: string;
  /** Group of the guys. */
  group: string;
  /** Unit taken in turn; default 'guy'. */
  by?: 'guy' | 'level';
  /** Default 'eachBare'. */
  pattern?: 'eachBare' | 'eachIced';
}
