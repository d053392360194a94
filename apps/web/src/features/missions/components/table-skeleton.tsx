/** Props of TableSkeleton. */
export interface TableSkeletonProps {
  /** What is loading, announced to screen readers ("Loading vehicles…"). */
  label: string;
  /** Placeholder rows; 3 unless given. */
  rows?: number;
}

/**
 * A table-shaped placeholder of fixed row height, so that a section keeps its place while its
 * data loads and the page does not jump when it arrives.
 */
export function TableSkeleton({ label, rows = 3 }: TableSkeletonProps) {
  return (
    <div role="status" className="overflow-hidden rounded-lg border border-rule bg-paper-raised">
      <span className="sr-only">{label}</span>
      <div aria-hidden="true" className="h-[33px] border-b border-rule" />
      <div aria-hidden="true" className="divide-y divide-rule">
        {Array.from({ length: rows }, (_, index) => (
          <div key={index} className="flex h-10 items-center gap-4 px-3">
            <span className="h-3 w-1/4 animate-pulse rounded bg-paper-sunk motion-reduce:animate-none" />
            <span className="h-3 w-1/6 animate-pulse rounded bg-paper-sunk motion-reduce:animate-none" />
            <span className="h-3 w-1/3 animate-pulse rounded bg-paper-sunk motion-reduce:animate-none" />
          </div>
        ))}
      </div>
    </div>
  );
}
