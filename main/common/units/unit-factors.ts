/**
 * Exact conversion factors to SI, by definition (NIST Special Publication 811, 2008 edition,
 * "Guide for the Use of the International System of Units", Appendix B.8/B.9; the international
 * yard and pound agreement of 1959; the standard acceleration of gravity of the 3rd CGPM, 1901):
 *
 *   1 in  = 0.0254 m                     (exact)
 *   1 ft  = 0.3048 m                     (exact)
 *   1 lb  = 0.45359237 kg                (avoirdupois pound, exact)
 *   g_n   = 9.80665 m/s²                 (exact)
 *   1 lbf = 1 lb × g_n = 4.4482216152605 N (exact)
 *   1 kip = 1000 lbf = 4448.2216152605 N  (exact)
 *   1 mph = 0.44704 m/s                  (exact: 5280 ft per hour)
 *   1 °F  = 5/9 K as a temperature difference; t/°F = (T/K − 273.15) × 9/5 + 32.
 */
export const METRES_PER_INCH = 0.0254;
export const METRES_PER_FOOT = 0.3048;
export const KILOGRAMS_PER_POUND = 0.45359237;
export const STANDARD_GRAVITY = 9.80665;
export const NEWTONS_PER_POUND_FORCE = KILOGRAMS_PER_POUND * STANDARD_GRAVITY;
export const NEWTONS_PER_KIP = 1000 * NEWTONS_PER_POUND_FORCE;
export const METRES_PER_SECOND_PER_MPH = 0.44704;
/** Kelvin per degree Fahrenheit (temperature difference). */
export const KELVIN_PER_FAHRENHEIT_DEGREE = 5 / 9;
/** 0 °C in kelvin. */
export const ICE_POINT_KELVIN = 273.15;
