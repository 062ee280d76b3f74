import type { ReactNode } from "react";
import { cn } from "./cn";

export interface PageHeaderProps {
  title: ReactNode;
  description?: ReactNode;
  /** Buttons shown on the right (wrap below on narrow screens). */
  actions?: ReactNode;
  /** Small line above the title, e.g. a breadcrumb or a status badge. */
  eyebrow?: ReactNode;
  className?: string;
}

/** The title block at the top of every signed-in screen. */
export function PageHeader({ title, description, actions, eyebrow, className }: PageHeaderProps) {
  return (
    <header className={cn("flex flex-wrap items-end justify-between gap-x-6 gap-y-3 pb-6", className)}>
      <div className="min-w-0">
        {eyebrow ? <div className="mb-1.5 flex items-center gap-2 text-xs text-muted">{eyebrow}</div> : null}
        <h1 className="text-2xl font-semibold tracking-tight text-ink">{title}</h1>
        {description ? <p className="mt-1 max-w-2xl text-sm text-muted">{description}</p> : null}
      </div>
      {actions ? <div className="flex flex-wrap items-center gap-2">{actions}</div> : null}
    </header>
  );
}
