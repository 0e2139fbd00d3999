/**
 * A private mathjs instance for unit-aware entry, used only at the edge (parsing what the user
 * types). The project file and every store hold plain SI numbers.
 *
 * Exact definitions (NIST SP 811, 2008, App. B; the 1959 international yard and pound agreement):
 *   1 in = 0.0254 m, 1 ft = 0.3048 m, 1 lb (mass) = 0.45359237 kg,
 *   1 lbf = 0.45359237 kg × 9.80665 m/s² = 4.4482216152605 N.
 * mathjs defines `kip` as a rounded 4448.2216 N, so it is redefined here as exactly 1000 lbf,
 * and `ksi` (not built in) as 1000 lbf/in².
 */
import { create, all, type MathJsInstance } from 'mathjs';

let instance: MathJsInstance | null = null;

export function unitMath(): MathJsInstance {
  if (instance) return instance;
  const m = create(all, {});
  m.createUnit('kip', { definition: '1000 lbf' }, { override: true });
  m.createUnit('ksi', { definition: '1000 lbf/in^2' }, { override: true });
  m.createUnit('psf', { definition: '1 lbf/ft^2' }, { override: true });
  instance = m;
  return m;
}
