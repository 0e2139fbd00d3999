/**
 * Ranges of real tension members and site conditions used by the plausibility warnings. A value
 * outside is not an error (the file is valid and the solver runs) but is probably a unit slip or
 * a typing error; the warning names the entry and the range. Sources beside each range.
 */

/**
 * Effective modulus of steel strand, rope and tension rods, Pa: 80–220 GPa. Recalled, check
 * against the standard: EN 1993-1-11 (tension components) gives about 100 kN/mm² for strand
 * ropes with a steel core, 150 for spiral strand, 160 for full-locked coil and 210 for bars;
 * the lower end leaves room for ropes with a fibre core.
 */
export const CABLE_MODULUS = { min: 80e9, max: 220e9 } as const;

/** Any structural material (timber ~10 GPa up to steel): below this a modulus is almost surely in MPa or kN/mm². Common practice. */
export const ANY_MODULUS_MIN = 1e9;

/**
 * Mass per length over metallic area of steel tension members, kg/m³: 7,000–11,000. Steel is
 * 7,850 kg/m³ (EN 1993-1-1, recalled); strand and rope weigh more per metallic area through lay,
 * lubricant and a fibre core (common practice: a factor up to about 1.3).
 */
export const CABLE_DENSITY = { min: 7000, max: 11000 } as const;

/**
 * Breaking load over metallic area, Pa: 400–2,200 MPa. Recalled, check against the standards:
 * tension rods of structural steel start near 400 N/mm² ultimate; strand wire grades run to about
 * 1,960–2,160 N/mm² (EN 10264), strands lower after spinning loss.
 */
export const CABLE_STRENGTH = { min: 400e6, max: 2200e6 } as const;

/** Elastic strain of steel under working pretension stays well below 1 % (yield ≈ 0.5–0.8 %). Common practice. */
export const MAX_PRETENSION_STRAIN = 0.01;

/**
 * Temperature change from the reference, K: ±100. Outdoor shade air temperatures stay within
 * about −50 °C … +50 °C (EN 1991-1-5 maps, recalled), and members in the sun a few tens of
 * kelvin above that; a change of more than 100 K is outside any site. Common practice.
 */
export const MAX_TEMPERATURE_CHANGE = 100;

/**
 * Radial ice thickness, m: at most 0.2. Recalled, check against the standard: ISO 12494 ice
 * classes for glaze run to a few centimetres; rime on exposed sites builds larger vanes, but a
 * radial thickness above 0.2 m is beyond the classes.
 */
export const MAX_ICE_THICKNESS = 0.2;

/** Ice density, kg/m³: 200 (soft rime) to 920 (glaze). ISO 12494 (recalled). */
export const ICE_DENSITY = { min: 200, max: 920 } as const;

/**
 * Sag over span above which a cable is a unit slip rather than a design: guy and canopy cables
 * sag a few per cent of their span (common practice); a quarter of the span is a hanging rope.
 */
export const MAX_SAG_RATIO = 0.25;
