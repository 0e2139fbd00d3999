/**
 * An input problem the solver finds while it runs, thrown with its structured message (code,
 * quantities in SI with their kinds, refs: message-types.ts) so the edge words it in the user's
 * display units. `message` is a plain SI wording for logs and callers that do not word it.
 */
import type { OutcomeMessage } from './message-types.ts';

export class OutcomeError<C extends string = string> extends Error {
  constructor(readonly outcome: OutcomeMessage<C>, siText: string) {
    super(siText);
    this.name = 'OutcomeError';
  }
}

/** The same problem with more refs (e.g. the entry that was being read), message prefixed by `prefix`. */
export function withRefs<C extends string>(e: OutcomeError<C>, refs: OutcomeMessage['refs'], prefix: string): OutcomeError<C> {
  return new OutcomeError({ ...e.outcome, refs: { ...e.outcome.refs, ...refs } }, `${prefix}${e.message}`);
}
