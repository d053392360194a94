/** The caution every page carries (DESIGN.md, "Cautions"). */
export const cautionText =
  "Photon Ledger is an analysis aid: check every result by independent analysis and your programme's verified processes before any flight or operational decision.";

/** The page footer with the caution line. */
export function CautionFooter() {
  return (
    <footer className="border-t border-rule bg-paper-sunk/60">
      <p className="mx-auto max-w-6xl px-4 py-4 text-xs leading-relaxed text-ink-soft sm:px-6">{cautionText}</p>
    </footer>
  );
}
