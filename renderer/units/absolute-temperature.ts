/**
 * Absolute temperatures (reference and installation temperatures, K in the file) shown in °C (SI
 * display) or °F (US display): °C = K − 273.15, °F = (K − 273.15) × 9/5 + 32 (exact by definition,
 * NIST SP 811 (2008), 4.2.1.1 and Appendix B).
 */
import type { UnitSystem } from './quantity-kinds.ts';

export function temperatureLabel(system: UnitSystem): string {
  return system === 'SI' ? '°C' : '°F';
}

export function kelvinToDisplay(k: number, system: UnitSystem): number {
  const c = k - 273.15;
  return Number((system === 'SI' ? c : c * 9 / 5 + 32).toFixed(6));
}

export function displayToKelvin(t: number, system: UnitSystem): number {
  return Number(((system === 'SI' ? t : (t - 32) * 5 / 9) + 273.15).toFixed(9));
}
