import { Skeleton, Spinner } from "@/components/ui/spinner";

/** Shown while a signed-in screen loads: the shape of a page header and a table. */
export default function WorkbenchLoading() {
  return (
    <div aria-busy="true" aria-live="polite">
      <div className="flex items-end justify-between gap-6 pb-6">
        <div className="flex flex-col gap-2">
          <Skeleton className="h-3 w-24" />
          <Skeleton className="h-7 w-56" />
          <Skeleton className="h-4 w-80 max-w-full" />
        </div>
        <Skeleton className="hidden h-9 w-28 sm:block" />
      </div>
      <div className="rounded-panel border border-line bg-surface">
        <div className="flex items-center gap-2 border-b border-line px-5 py-3 text-sm text-muted">
          <Spinner size={14} className="text-accent" />
          <span role="status">Loading…</span>
        </div>
        <div className="flex flex-col gap-3 px-5 py-4">
          {[0, 1, 2, 3, 4, 5].map((i) => (
            <div key={i} className="grid grid-cols-[2fr_1fr_1fr_1fr] gap-4">
              <Skeleton className="h-4" />
              <Skeleton className="h-4" />
              <Skeleton className="h-4" />
              <Skeleton className="h-4" />
            </div>
          ))}
        </div>
      </div>
    </div>
  );
}
