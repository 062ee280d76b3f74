/** A letter tag (A, B, C …) that names a tour in every Compare panel, so rows never rely on colour. */
export function tagOf(index: number): string {
  return String.fromCharCode(65 + index);
}

export function TourTag({ index, className = "" }: { index: number; className?: string }) {
  return (
    <span
      aria-hidden
      className={`inline-flex h-5 w-5 shrink-0 items-center justify-center rounded border border-line-strong bg-raised font-mono text-[11px] font-semibold text-ink ${className}`}
    >
      {tagOf(index)}
    </span>
  );
}
