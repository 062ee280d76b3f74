import { useId, type ComponentProps, type ReactNode } from "react";
import { cn } from "./cn";

const control =
  "block w-full rounded-md border border-line-strong bg-field px-3 text-sm text-ink placeholder:text-faint " +
  "transition-colors hover:border-muted focus:border-accent focus:outline-none focus-visible:outline-2 focus-visible:outline-offset-1 focus-visible:outline-accent " +
  "disabled:cursor-not-allowed disabled:opacity-60 aria-[invalid=true]:border-bad";

interface FieldChrome {
  /** Visible label text; it is also the control's accessible name. */
  label: ReactNode;
  /** Error message shown under the control (role="alert" is not used; it is linked via aria-describedby). */
  error?: string | null;
  /** Help text shown under the control when there is no error. */
  hint?: ReactNode;
  /** Class for the wrapping element. */
  className?: string;
  /** Small text after the label, e.g. a unit "km/s". */
  unit?: string;
}

function FieldFrame({
  id,
  label,
  unit,
  error,
  hint,
  className,
  children,
}: FieldChrome & { id: string; children: ReactNode }) {
  return (
    <div className={cn("flex flex-col gap-1.5", className)}>
      <label htmlFor={id} className="flex items-baseline justify-between gap-2 text-sm font-medium text-ink">
        <span>{label}</span>
        {unit ? <span className="num text-xs font-normal text-faint">{unit}</span> : null}
      </label>
      {children}
      {error ? (
        <p id={`${id}-error`} className="flex items-start gap-1.5 text-xs text-bad">
          <svg viewBox="0 0 12 12" width="12" height="12" aria-hidden className="mt-px shrink-0">
            <circle cx="6" cy="6" r="5.25" fill="none" stroke="currentColor" strokeWidth="1.2" />
            <path d="M6 3.2v3.3" stroke="currentColor" strokeWidth="1.3" strokeLinecap="round" />
            <circle cx="6" cy="8.6" r="0.75" fill="currentColor" />
          </svg>
          <span>{error}</span>
        </p>
      ) : hint ? (
        <p id={`${id}-hint`} className="text-xs text-muted">
          {hint}
        </p>
      ) : null}
    </div>
  );
}

function describedBy(id: string, error?: string | null, hint?: ReactNode): string | undefined {
  if (error) return `${id}-error`;
  if (hint) return `${id}-hint`;
  return undefined;
}

export type FieldProps = FieldChrome & Omit<ComponentProps<"input">, "className">;

/** Label + input + error text. */
export function Field({ label, error, hint, unit, className, id, ...input }: FieldProps) {
  const auto = useId();
  const fid = id ?? auto;
  return (
    <FieldFrame id={fid} label={label} error={error} hint={hint} unit={unit} className={className}>
      <input
        id={fid}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(fid, error, hint)}
        className={cn(control, "h-9")}
        {...input}
      />
    </FieldFrame>
  );
}

export type SelectFieldProps = FieldChrome & Omit<ComponentProps<"select">, "className">;

/** Label + native select + error text. Pass <option>s as children. */
export function SelectField({ label, error, hint, unit, className, id, children, ...select }: SelectFieldProps) {
  const auto = useId();
  const fid = id ?? auto;
  return (
    <FieldFrame id={fid} label={label} error={error} hint={hint} unit={unit} className={className}>
      <div className="relative">
        <select
          id={fid}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(fid, error, hint)}
          className={cn(control, "h-9 appearance-none pr-8")}
          {...select}
        >
          {children}
        </select>
        <svg
          viewBox="0 0 12 12"
          width="12"
          height="12"
          aria-hidden
          className="pointer-events-none absolute top-1/2 right-3 -translate-y-1/2 text-muted"
        >
          <path d="M3 4.5 6 7.5 9 4.5" fill="none" stroke="currentColor" strokeWidth="1.4" strokeLinecap="round" />
        </svg>
      </div>
    </FieldFrame>
  );
}

export type TextareaFieldProps = FieldChrome & Omit<ComponentProps<"textarea">, "className">;

/** Label + textarea + error text. */
export function TextareaField({ label, error, hint, unit, className, id, rows = 4, ...area }: TextareaFieldProps) {
  const auto = useId();
  const fid = id ?? auto;
  return (
    <FieldFrame id={fid} label={label} error={error} hint={hint} unit={unit} className={className}>
      <textarea
        id={fid}
        rows={rows}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(fid, error, hint)}
        className={cn(control, "py-2 leading-relaxed")}
        {...area}
      />
    </FieldFrame>
  );
}
