/**
 * Words for the input problems the site computations find while they run (the as-built readings'
 * inversions, the installation table's range): the solver throws an OutcomeError with a code and
 * SI quantities; these words put them in the display units (°C / °F, kN / kip, Hz), naming the
 * reading. Used by the site worker's request runner (site-run.ts) and the CLI.
 */
import { OutcomeError, type OutcomeMessage } from '../../../solver/index.ts';
import { messageQuantityText, type UnitSystem } from '../units/index.ts';

const MODE_WORDS: Record<string, string> = { tautString: 'taut-string', inPlaneSymmetric: 'symmetric in-plane', inPlaneAntisymmetric: 'antisymmetric in-plane', lowestInPlane: 'lowest in-plane' };

/** One site input problem as a sentence, or null for a code these words do not know. */
export function siteInputText(m: OutcomeMessage, units: UnitSystem): string | null {
  const q = (k: string) => (m.quantities[k] ? messageQuantityText(m.quantities[k], units) : '—');
  const entry = typeof m.refs.entry === 'string' ? `${m.refs.entry}: ` : '';
  const member = typeof m.refs.member === 'string' ? ` "${m.refs.member}"` : '';
  switch (m.code) {
    case 'noTensionForFrequency': {
      const mode = String(m.refs.mode ?? '');
      return `${entry}no tension of member${member} between ${q('low')} and ${q('high')} gives the measured ${q('frequency')} in the ${MODE_WORDS[mode] ?? mode} mode: check the reading and the mode`;
    }
    case 'temperatureOutsideTable':
      return `${entry}site check of member${member}: ${q('temperature')} is outside the installation table (${q('low')} … ${q('high')})`;
    case 'tableRowNotConverged':
      return `${entry}site check of member${member}: the installation table row at ${q('temperature')} did not converge`;
    default:
      return null;
  }
}

/** The words of any error: an OutcomeError the words know in the display units, else its message. */
export function siteErrorText(e: unknown, units: UnitSystem): string {
  if (e instanceof OutcomeError) return siteInputText(e.outcome, units) ?? e.message;
  return e instanceof Error ? e.message : String(e);
}
