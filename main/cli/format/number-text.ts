/** Fixed-decimal number text for tables; never prints "-0.00". Non-finite values print as "n/a". */
export function fixed(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return 'n/a';
  const text = value.toFixed(decimals);
  return /^-0\.?0*$/.test(text) ? text.slice(1) : text;
}

/** Newtons → kilonewtons, 2 decimals (10 N resolution). */
export const kN = (newtons: number): string => fixed(newtons / 1000, 2);

/** Metres with 4 decimals (0.1 mm resolution), for displacements. */
export const metres4 = (m: number): string => fixed(m, 4);

/** Metres with 3 decimals (1 mm resolution), for sags and lengths. */
export const metres3 = (m: number): string => fixed(m, 3);
