import { cn } from "./cn";

export interface NumProps {
  value: number | null | undefined;
  /** Always shown after the number, e.g. "km/s", "km²/s²", "°", "d". */
  unit?: string;
  /** Fixed decimals (default 2). */
  digits?: number;
  /** Prefix positive values with "+" (for deltas). */
  signed?: boolean;
  /** Group thousands with a thin space (default false, so copied numbers paste as numbers). */
  group?: boolean;
  className?: string;
  title?: string;
}

const MINUS = "-"; // ASCII, so copied values parse in spreadsheets and scripts
const THIN = "\u2009";

/** Format a number the way <Num> shows it: "—" for null/NaN, "∞" for Infinity, "-0" shown as "0". */
export function formatNum(
  value: number | null | undefined,
  digits = 2,
  opts: { signed?: boolean; group?: boolean } = {},
): string {
  if (value === null || value === undefined || Number.isNaN(value)) return "—";
  if (value === Infinity) return "∞";
  if (value === -Infinity) return `${MINUS}∞`;
  const abs = Math.abs(value);
  let body = abs.toFixed(Math.max(0, Math.min(20, Math.trunc(digits))));
  const group = opts.group ?? false;
  if (group) {
    const [int = "", frac] = body.split(".");
    body = int.replace(/\B(?=(\d{3})+(?!\d))/g, THIN) + (frac !== undefined ? `.${frac}` : "");
  }
  // -0.000 shows as 0.000
  const isZero = Number(abs.toFixed(Math.max(0, Math.min(20, Math.trunc(digits))))) === 0;
  const sign = value < 0 && !isZero ? MINUS : opts.signed && value > 0 && !isZero ? "+" : "";
  return sign + body;
}

/** A number in monospace tabular digits with its unit always shown. */
export function Num({ value, unit, digits = 2, signed, group, className, title }: NumProps) {
  const text = formatNum(value, digits, { signed, group });
  const missing = text === "—";
  return (
    <span className={cn("num whitespace-nowrap", className)} title={title} data-value={missing ? "" : String(value)}>
      <span className={missing ? "text-faint" : undefined}>{text}</span>
      {unit ? <span className="ml-1 text-[0.85em] text-muted">{unit}</span> : null}
    </span>
  );
}
