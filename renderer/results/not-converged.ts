/**
 * What the app says about a case that did not converge: a title naming the reason and what to
 * try. Its tensions, colours and displacements are not shown (they are an unfinished iterate, not
 * a result). The advice is common practice for nonlinear cable analysis, not a rule.
 */
import type { CaseResult } from '../../solver/index.ts';

export interface NotConvergedState {
  title: string;
  /** The solver's own explanation (names nodes and directions for a mechanism), if any. */
  reason: string;
  tryThis: string[];
}

export function notConvergedState(c: Pick<CaseResult, 'id' | 'status' | 'message'>): NotConvergedState {
  const reason = c.message ?? '';
  switch (c.status) {
    case 'singular':
      return {
        title: `Case "${c.id}" did not converge: the structure is a mechanism`, reason,
        tryThis: [
          'restrain or connect the nodes and directions named above (a node on one bar or on cables only in one plane can move freely)',
          'give cables that start slack a pretension, or shorten their unstressed length',
          'check that supports have the letters x, y, z they need',
        ],
      };
    case 'limitPoint':
      return {
        title: `Case "${c.id}" did not converge: the load passes a limit point (buckling or snap-through)`, reason,
        tryThis: ['reduce the loads or their factors', 'stiffen or brace the part that buckles (bars in compression)', 'raise the pretension of the guys that go slack'],
      };
    case 'cancelled':
      return { title: `Case "${c.id}" was cancelled`, reason, tryThis: ['run the analysis again (F5)'] };
    default:
      return {
        title: `Case "${c.id}" did not converge (${c.status === 'diverged' ? 'the iterations diverged' : 'iteration limit reached'})`, reason,
        tryThis: [
          'check the loads for a wrong sign or unit (e.g. N typed where kN was meant)',
          'give slack cables pretension or a shorter unstressed length so they start taut',
          'split long cables into more segments, or fewer if a segment is very short',
          'check the supports: a structure that is barely restrained moves far under load',
        ],
      };
  }
}
