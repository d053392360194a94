/** Printed with every result the command line produces. */
export const CAUTION =
  'Photon Ledger is an analysis aid: check these results by independent analysis and your programme\'s verified processes before any flight or operational decision.';
