"use client";
/**
 * Compact controls for the dense Workbench panels: a native select and text inputs that keep
 * what the user types locally and commit only valid values (so half-typed input never reaches
 * the draft, and bad input never crashes anything).
 */
import { useEffect, useId, useState, type ComponentProps, type ReactNode } from "react";
import { cn } from "@/components/ui/cn";
import { parseNumberInput, tdbToUtcInput, utcInputToTdb } from "@/lib/client/workbench-edits";

const control =
  "h-8 w-full rounded-md border border-line-strong bg-field px-2 text-sm text-ink transition-colors " +
  "hover:border-muted focus:border-accent focus:outline-none focus-visible:outline-2 focus-visible:outline-offset-1 " +
  "focus-visible:outline-accent disabled:cursor-not-allowed disabled:opacity-60 aria-[invalid=true]:border-bad";

export interface MiniLabelProps {
  label: ReactNode;
  unit?: string;
  htmlFor: string;
  className?: string;
  children: ReactNode;
  error?: string | null;
}

export function MiniLabel({ label, unit, htmlFor, className, children, error }: MiniLabelProps) {
  return (
    <div className={cn("flex min-w-0 flex-col gap-1", className)}>
      <label htmlFor={htmlFor} className="flex items-baseline justify-between gap-1 text-[11px] font-medium tracking-wide text-muted uppercase">
        <span className="truncate">{label}</span>
        {unit ? <span className="num normal-case text-faint">{unit}</span> : null}
      </label>
      {children}
      {error ? (
        <p id={`${htmlFor}-error`} className="text-xs text-bad">
          {error}
        </p>
      ) : null}
    </div>
  );
}

export interface MiniSelectProps extends Omit<ComponentProps<"select">, "className"> {
  label: ReactNode;
  className?: string;
}

export function MiniSelect({ label, className, children, id, ...rest }: MiniSelectProps) {
  const auto = useId();
  const fid = id ?? auto;
  return (
    <MiniLabel label={label} htmlFor={fid} className={className}>
      <select id={fid} className={cn(control, "pr-1")} {...rest}>
        {children}
      </select>
    </MiniLabel>
  );
}

export interface EpochInputProps {
  label: ReactNode;
  /** TDB s past J2000. */
  value: number;
  /** Called with a valid epoch (TDB s) as the user edits. */
  onCommit(epoch: number): void;
  className?: string;
  "data-testid"?: string;
}

/**
 * An epoch typed as an ISO UTC date and time, "YYYY-MM-DD HH:MM" (unambiguous whatever the
 * browser's locale; the draft keeps TDB seconds). Valid input is committed as it is typed; what
 * is not valid is explained when the field is left, and then reverts.
 */
export function EpochInput({ label, value, onCommit, className, ...rest }: EpochInputProps) {
  const fid = useId();
  const fromProp = tdbToUtcInput(value).replace("T", " ");
  const [text, setText] = useState(fromProp);
  const [error, setError] = useState<string | null>(null);
  const [focused, setFocused] = useState(false);
  useEffect(() => {
    if (!focused) setText(fromProp);
  }, [fromProp, focused]);
  return (
    <MiniLabel label={label} unit="UTC" htmlFor={fid} className={className} error={error}>
      <input
        id={fid}
        type="text"
        inputMode="numeric"
        spellCheck={false}
        autoComplete="off"
        placeholder="YYYY-MM-DD HH:MM"
        value={text}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${fid}-error` : undefined}
        className={cn(control, "num")}
        data-testid={rest["data-testid"]}
        onFocus={() => setFocused(true)}
        onChange={(e) => {
          const v = e.target.value;
          setText(v);
          const t = utcInputToTdb(v.trim().replace(" ", "T"));
          if (t !== null) {
            setError(null);
            onCommit(t);
          }
        }}
        onBlur={() => {
          setFocused(false);
          const t = utcInputToTdb(text.trim().replace(" ", "T"));
          if (t === null) {
            setError(`“${text}” is not a date; use YYYY-MM-DD HH:MM (UTC).`);
            setText(fromProp);
          } else {
            setError(null);
            setText(fromProp);
          }
        }}
        onKeyDown={(e) => {
          if (e.key === "Enter") (e.target as HTMLInputElement).blur();
        }}
      />
    </MiniLabel>
  );
}

export interface NumberInputProps {
  label: ReactNode;
  unit?: string;
  value: number | null;
  /** Shown when the value is empty (e.g. the default). */
  placeholder?: string;
  /** Called with a valid number, or null when the field is cleared (if `allowEmpty`). */
  onCommit(value: number | null): void;
  allowEmpty?: boolean;
  min?: number;
  /** Exclusive upper bound. */
  maxExclusive?: number;
  /** Inclusive lower bound is `min`; `minExclusive` makes it exclusive. */
  minExclusive?: boolean;
  className?: string;
  digits?: number;
  "data-testid"?: string;
}

/** A number field that commits only valid values and explains what is wrong otherwise. */
export function NumberInput({
  label,
  unit,
  value,
  placeholder,
  onCommit,
  allowEmpty = false,
  min,
  maxExclusive,
  minExclusive = false,
  className,
  ...rest
}: NumberInputProps) {
  const fid = useId();
  const fromProp = value === null || !Number.isFinite(value) ? "" : String(value);
  const [text, setText] = useState(fromProp);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    setText(fromProp);
    setError(null);
  }, [fromProp]);
  const check = (v: string): { ok: true; value: number | null } | { ok: false; message: string } => {
    if (v.trim() === "") return allowEmpty ? { ok: true, value: null } : { ok: false, message: "Required." };
    const x = parseNumberInput(v);
    if (x === null) return { ok: false, message: "Not a number." };
    if (min !== undefined && (minExclusive ? x <= min : x < min)) return { ok: false, message: `Must be ${minExclusive ? ">" : "≥"} ${min}.` };
    if (maxExclusive !== undefined && x >= maxExclusive) return { ok: false, message: `Must be < ${maxExclusive}.` };
    return { ok: true, value: x };
  };
  return (
    <MiniLabel label={label} unit={unit} htmlFor={fid} className={className} error={error}>
      <input
        id={fid}
        type="text"
        inputMode="decimal"
        value={text}
        placeholder={placeholder}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${fid}-error` : undefined}
        className={cn(control, "num")}
        data-testid={rest["data-testid"]}
        onChange={(e) => {
          const v = e.target.value;
          setText(v);
          const r = check(v);
          if (!r.ok) {
            setError(r.message);
            return;
          }
          setError(null);
          onCommit(r.value);
        }}
        onBlur={() => {
          if (error) {
            setText(fromProp);
            setError(null);
          }
        }}
      />
    </MiniLabel>
  );
}

/** A small square icon button with an accessible name. */
export function IconButton({
  label,
  className,
  children,
  ...rest
}: Omit<ComponentProps<"button">, "aria-label"> & { label: string }) {
  return (
    <button
      type="button"
      aria-label={label}
      title={label}
      className={cn(
        "inline-flex size-7 items-center justify-center rounded-md text-muted transition-colors hover:bg-raised hover:text-ink " +
          "focus-visible:outline-2 focus-visible:outline-offset-1 focus-visible:outline-accent disabled:cursor-not-allowed disabled:opacity-40",
        className,
      )}
      {...rest}
    >
      {children}
    </button>
  );
}

export function Glyph({ d, size = 14 }: { d: string; size?: number }) {
  return (
    <svg viewBox="0 0 16 16" width={size} height={size} fill="none" aria-hidden>
      <path d={d} stroke="currentColor" strokeWidth="1.5" strokeLinecap="round" strokeLinejoin="round" />
    </svg>
  );
}

export const GLYPHS = {
  up: "M8 12.5V3.5M4 7.5l4-4 4 4",
  down: "M8 3.5v9M4 8.5l4 4 4-4",
  remove: "M4 4l8 8M12 4l-8 8",
  add: "M8 3.5v9M3.5 8h9",
  undo: "M6 3.5 2.5 7 6 10.5M3 7h6.5a4 4 0 0 1 0 8H8",
  redo: "M10 3.5 13.5 7 10 10.5M13 7H6.5a4 4 0 0 0 0 8H8",
  play: "M5 3.5v9l7-4.5z",
  pause: "M5.5 3.5v9M10.5 3.5v9",
  toStart: "M4 3.5v9M12 3.5 6.5 8l5.5 4.5z",
} as const;
