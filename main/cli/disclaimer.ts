/** Printed with every result: the program supports engineers, it does not replace them. */
export const RESULTS_DISCLAIMER =
  'Results are for review by a qualified engineer; local codes and licensed practice govern. ' +
  'Do not use results of an analysis that did not converge.';
