import type { ReactNode } from "react";
import { cn } from "@/components/ui/cn";

export interface InlineAlertProps {
  tone?: "bad" | "ok" | "info";
  children: ReactNode;
  className?: string;
  /** Buttons after the text, e.g. "Reload". */
  actions?: ReactNode;
}

/** A one-line message inside a panel: an icon plus text (colour is never the only signal). */
export function InlineAlert({ tone = "bad", children, className, actions }: InlineAlertProps) {
  const tones = {
    bad: "border-bad/45 bg-bad-soft text-ink",
    ok: "border-ok/40 bg-ok-soft text-ink",
    info: "border-info/40 bg-info-soft text-ink",
  } as const;
  return (
    <div role={tone === "bad" ? "alert" : "status"} className={cn("flex flex-wrap items-start gap-2 rounded-md border px-3 py-2 text-sm", tones[tone], className)}>
      <svg viewBox="0 0 16 16" width="16" height="16" fill="none" aria-hidden className={cn("mt-0.5 shrink-0", tone === "bad" ? "text-bad" : tone === "ok" ? "text-ok" : "text-info")}>
        {tone === "ok" ? (
          <path d="m3.5 8.3 3 3 6-6.3" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" strokeLinejoin="round" />
        ) : (
          <>
            <circle cx="8" cy="8" r="6.5" stroke="currentColor" strokeWidth="1.4" />
            <path d={tone === "bad" ? "M8 4.6v4" : "M8 7.2v4"} stroke="currentColor" strokeWidth="1.5" strokeLinecap="round" />
            <circle cx="8" cy={tone === "bad" ? 11.2 : 4.8} r="0.9" fill="currentColor" />
          </>
        )}
      </svg>
      <span className="min-w-0 flex-1">{children}</span>
      {actions ? <span className="flex shrink-0 gap-2">{actions}</span> : null}
    </div>
  );
}
