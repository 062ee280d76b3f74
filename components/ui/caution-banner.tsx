import { cn } from "./cn";

export const CAUTION_TEXT =
  "Preliminary patched-conic design — not for operations. Verify with high-fidelity navigation software and your project's flight-dynamics authority. Planetary-protection rules and impact-probability limits are the project's and its agency's to set.";

export interface CautionBannerProps {
  className?: string;
}

/** The caution every result screen shows. Compact, but always visible. */
export function CautionBanner({ className }: CautionBannerProps) {
  return (
    <aside
      data-testid="caution-banner"
      aria-label="Caution"
      className={cn(
        "flex items-start gap-2.5 rounded-md border border-warn/40 bg-warn-soft px-3 py-2 text-xs leading-relaxed text-ink",
        className,
      )}
    >
      <svg viewBox="0 0 16 16" width="16" height="16" fill="none" aria-hidden className="mt-px shrink-0 text-warn">
        <path d="M8 1.8 14.6 13.6H1.4z" stroke="currentColor" strokeWidth="1.4" strokeLinejoin="round" />
        <path d="M8 6.2v3.3" stroke="currentColor" strokeWidth="1.5" strokeLinecap="round" />
        <circle cx="8" cy="11.5" r="0.85" fill="currentColor" />
      </svg>
      <p>
        <strong className="font-semibold">Preliminary patched-conic design — not for operations.</strong>{" "}
        Verify with high-fidelity navigation software and your project&apos;s flight-dynamics authority.
        Planetary-protection rules and impact-probability limits are the project&apos;s and its agency&apos;s to set.
      </p>
    </aside>
  );
}
