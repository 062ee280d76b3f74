import { cn } from "./cn";

export interface SpinnerProps {
  size?: number;
  className?: string;
  /** Accessible label; when omitted the spinner is decorative. */
  label?: string;
}

/** A small orbiting-dot spinner in the current text colour. */
export function Spinner({ size = 16, className, label }: SpinnerProps) {
  return (
    <svg
      width={size}
      height={size}
      viewBox="0 0 16 16"
      fill="none"
      className={cn("shrink-0 animate-sweep", className)}
      role={label ? "status" : undefined}
      aria-label={label}
      aria-hidden={label ? undefined : true}
    >
      <circle cx="8" cy="8" r="6" stroke="currentColor" strokeOpacity="0.25" strokeWidth="1.5" />
      <path d="M8 2a6 6 0 0 1 6 6" stroke="currentColor" strokeWidth="1.5" strokeLinecap="round" />
      <circle cx="14" cy="8" r="1.6" fill="currentColor" />
    </svg>
  );
}

export interface SkeletonProps {
  className?: string;
}

/** A placeholder block for content that is loading. Size it with className. */
export function Skeleton({ className }: SkeletonProps) {
  return <div aria-hidden className={cn("animate-shimmer rounded-md bg-raised", className)} />;
}
