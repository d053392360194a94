import type { ReactNode } from 'react';
import type { Review, ReviewSubjectType } from '@photon-ledger/shared';
import { LoadingState } from '../../../components/ui/loading-state';
import { ReviewHistory } from './review-history';
import { reviewStateLabels } from './review-state-badge';

/**
 * Print rules shared by the printable reports: A4, no app chrome, no buttons, black on white,
 * sections kept whole. Reports are laid out at most 680 CSS px wide on screen too, so their
 * canvases are drawn at the width of an A4 page (210 mm less 2 × 14 mm margins ≈ 688 px) and
 * print without scaling or clipping.
 */
export const reportPrintCss = `
@media print {
  @page { size: A4; margin: 16mm 14mm; }
  html, body { background: white !important; }
  body > div header, body > div footer, .no-print, [href="#main"] { display: none !important; }
  .report { display: flex !important; }
  main { max-width: none !important; padding: 0 !important; margin: 0 !important; }
  .report section { break-inside: avoid-page; }
  .report table { break-inside: auto; }
  .report tr { break-inside: avoid; }
  .report a { color: inherit; text-decoration: none; }
  .report canvas { max-width: 100% !important; }
}`;

/** A timestamp as a report prints it: `2026-12-02 05:51 UTC`, or a dash. */
export const reportTime = (iso: string | null | undefined) => (iso ? `${iso.slice(0, 16).replace('T', ' ')} UTC` : '—');

export function ReportSection({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="flex flex-col gap-2">
      <h2 className="text-lg font-semibold">{title}</h2>
      {children}
    </section>
  );
}

/** One term of a report's definition list. */
export function Term({ label, children }: { label: string; children: ReactNode }) {
  return (
    <>
      <dt className="text-ink-soft">{label}</dt>
      <dd>{children}</dd>
    </>
  );
}

interface ApprovalSectionProps {
  missionId: string;
  subjectType: ReviewSubjectType;
  subjectId: string;
  review: Review | undefined;
  failed: boolean;
}

/** The report's approval: state, who submitted and decided, the frozen content hash and whether it still matches, and the history. */
export function ApprovalSection({ missionId, subjectType, subjectId, review, failed }: ApprovalSectionProps) {
  return (
    <ReportSection title="Approval">
      {review ? (
        <>
          <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 text-sm">
            <Term label="State">{reviewStateLabels[review.state]}</Term>
            <Term label="Submitted">{review.submittedBy ? `${review.submittedBy.displayName}, ${reportTime(review.submittedAt)}` : '—'}</Term>
            <Term label={review.state === 'approved' ? 'Approved' : 'Decided'}>{review.decidedBy ? `${review.decidedBy.displayName}, ${reportTime(review.decidedAt)}` : '—'}</Term>
            {review.reason && <Term label="Reason">{review.reason}</Term>}
            {review.frozen && (
              <>
                <Term label="Content SHA-256">
                  <span className="font-mono text-xs break-all">{review.frozen.contentHash}</span>
                </Term>
                <Term label="Still matches">{review.intact === false ? 'NO — content changed after approval' : 'yes'}</Term>
              </>
            )}
          </dl>
          <h3 className="mt-2 text-sm font-semibold">History</h3>
          <ReviewHistory missionId={missionId} subjectType={subjectType} subjectId={subjectId} version={review.updatedAt} />
        </>
      ) : failed ? (
        <p className="text-sm text-alarm">The review could not be loaded.</p>
      ) : (
        <LoadingState label="Loading the review…" />
      )}
    </ReportSection>
  );
}
