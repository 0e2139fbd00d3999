/**
 * Every default the design-load and check code uses, with its source. Units SI.
 *
 * "Common practice" marks a value of the trade without a single citable source; "recalled"
 * marks a value quoted from memory of the named document — check it against your own copy.
 * Results are for review by a qualified engineer; local codes and licensed practice govern.
 */

/** Air density, kg/m³. ISO 2533:1975 International Standard Atmosphere at sea level, 15 °C. */
export const DEFAULT_AIR_DENSITY = 1.225;

/** Reference temperature, K (15 °C). ISA sea-level temperature, ISO 2533:1975. */
export const DEFAULT_REFERENCE_TEMPERATURE = 288.15;

/**
 * Drag coefficient of a stranded cable or round rod on its outer diameter, dimensionless.
 * Common practice (≈ 1.2 for stranded wire ropes and guys, subcritical flow).
 */
export const DEFAULT_CABLE_DRAG_COEFFICIENT = 1.2;

/**
 * Drag coefficient of iced cables on the ice-enlarged diameter. Common practice: the same 1.2
 * is used unless the code in force gives a separate iced value.
 */
export const DEFAULT_ICED_DRAG_COEFFICIENT = 1.2;

/**
 * Former fixed drag (force) factor of a lattice mast on its face area, dimensionless; no longer
 * used by the drag (which takes C_f(φ) from lattice-force-coefficient.ts unless the section sets
 * `lattice.dragFactor`). Kept for files and callers that name it. Common practice order of
 * magnitude for a triangular lattice of round members at low solidity.
 */
export const DEFAULT_LATTICE_DRAG_FACTOR = 2.0;

/**
 * Power-law exponent of the mean wind profile V(z) = V10 (z/10)^α. Common practice: the
 * "one-seventh power law" (Hellmann) for open country.
 */
export const DEFAULT_POWER_LAW_EXPONENT = 1 / 7;

/**
 * Roughness length z0, m, of the logarithmic profile. Recalled: EN 1991-1-4 Table 4.1,
 * terrain category II (low vegetation, isolated obstacles), z0 = 0.05 m.
 */
export const DEFAULT_ROUGHNESS_LENGTH = 0.05;

/**
 * Height below which every wind profile is held at its value at this height, m. Recalled:
 * EN 1991-1-4 Table 4.1, terrain category II, z_min = 2 m. The same cut-off is used for the power
 * law (which vanishes at z = 0) and the uniform profile ignores it.
 */
export const DEFAULT_PROFILE_MIN_HEIGHT = 2;

/**
 * Ice density, kg/m³. Recalled: ISO 12494:2017 gives 900 kg/m³ for glaze ice (rime is lighter,
 * roughly 200–900 kg/m³).
 */
export const DEFAULT_ICE_DENSITY = 900;

/**
 * Initial (installation) tension of generated guys as a share of their breaking load.
 * Common practice: guy initial tension about 10 % of breaking strength.
 */
export const DEFAULT_GUY_PRETENSION_SHARE = 0.1;
