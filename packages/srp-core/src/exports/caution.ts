/** The caution every exported product carries, word for word. */
export const EXPORT_CAUTION =
  "Photon Ledger is an analysis aid: check these results by independent analysis and your programme's verified processes before any flight or operational decision.";
