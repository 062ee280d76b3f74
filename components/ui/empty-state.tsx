import type { ReactNode } from "react";
import { cn } from "./cn";

export interface EmptyStateProps {
  title: ReactNode;
  description?: ReactNode;
  /** Buttons or links, e.g. a LinkButton to create the first item. */
  actions?: ReactNode;
  /** Replace the default drawing (an empty orbit) with your own icon. */
  icon?: ReactNode;
  className?: string;
}

/** Shown when a list or panel has nothing to show yet. */
export function EmptyState({ title, description, actions, icon, className }: EmptyStateProps) {
  return (
    <div
      className={cn(
        "flex flex-col items-center justify-center gap-3 rounded-panel border border-dashed border-line-strong px-6 py-12 text-center",
        className,
      )}
    >
      <div className="text-faint">
        {icon ?? (
          <svg viewBox="0 0 48 48" width="48" height="48" fill="none" aria-hidden>
            <ellipse cx="24" cy="24" rx="20" ry="9" stroke="currentColor" strokeWidth="1.3" strokeDasharray="3 3" transform="rotate(-18 24 24)" />
            <circle cx="24" cy="24" r="4.5" fill="currentColor" opacity="0.5" />
            <circle cx="42" cy="17.5" r="2.2" className="fill-accent" />
          </svg>
        )}
      </div>
      <h3 className="text-base font-semibold text-ink">{title}</h3>
      {description ? <p className="max-w-md text-sm text-muted">{description}</p> : null}
      {actions ? <div className="mt-2 flex flex-wrap items-center justify-center gap-2">{actions}</div> : null}
    </div>
  );
}
