/** Standard acceleration of gravity, m/s² (CGPM 1901; ISO 80000-3), acting along −z. */
export const STANDARD_GRAVITY = 9.80665;
