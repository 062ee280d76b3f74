import { cn } from "@/components/ui/cn";

export interface GybeMarkProps {
  /** Pixel size of the square mark. */
  size?: number;
  className?: string;
  /** Accessible name; when omitted the mark is decorative (aria-hidden). */
  title?: string;
}

/**
 * Gybe's mark: a hyperbolic flyby path swinging around a planet disc, with the
 * spacecraft as a dot on the outgoing leg. Drawn on a 32×32 grid.
 */
export function GybeMark({ size = 28, className, title }: GybeMarkProps) {
  return (
    <svg
      width={size}
      height={size}
      viewBox="0 0 32 32"
      fill="none"
      className={cn("shrink-0", className)}
      role={title ? "img" : undefined}
      aria-label={title}
      aria-hidden={title ? undefined : true}
    >
      {title ? <title>{title}</title> : null}
      {/* planet */}
      <circle cx="17.5" cy="16" r="5.75" className="fill-earth" />
      <path d="M12.2 17.9a5.75 5.75 0 0 0 10.3 1" className="stroke-canvas/40" strokeWidth="1.2" strokeLinecap="round" />
      {/* minimum-altitude ring, faint */}
      <circle cx="17.5" cy="16" r="8.6" className="stroke-line-strong" strokeWidth="0.9" strokeDasharray="1.6 2.2" />
      {/* the flyby: in from lower left, around the far side, out to upper left */}
      <path
        d="M2.5 28.5C13 25.5 27.6 24 27.6 16.2C27.6 9.5 18 6.6 6.2 4.6"
        className="stroke-accent"
        strokeWidth="2.4"
        strokeLinecap="round"
      />
      {/* spacecraft */}
      <circle cx="6.2" cy="4.6" r="2.3" className="fill-accent" />
    </svg>
  );
}

export interface GybeWordmarkProps {
  size?: "sm" | "md" | "lg";
  className?: string;
}

const wordSizes = {
  sm: { mark: 22, text: "text-base" },
  md: { mark: 28, text: "text-lg" },
  lg: { mark: 44, text: "text-3xl" },
} as const;

/** The mark followed by the name, for top bars and the landing page. */
export function GybeWordmark({ size = "md", className }: GybeWordmarkProps) {
  const s = wordSizes[size];
  return (
    <span className={cn("inline-flex items-center gap-2", className)}>
      <GybeMark size={s.mark} />
      <span className={cn("font-semibold tracking-tight text-ink", s.text)}>Gybe</span>
    </span>
  );
}
