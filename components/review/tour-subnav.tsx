import Link from "next/link";
import { cn } from "@/components/ui/cn";

export interface TourSubnavProps {
  tourId: number;
  current: "workbench" | "history" | "discussion";
  className?: string;
}

/** Links between a tour's screens: Workbench, History, Discussion. */
export function TourSubnav({ tourId, current, className }: TourSubnavProps) {
  const items = [
    { key: "workbench", href: `/tours/${tourId}`, label: "Workbench" },
    { key: "history", href: `/tours/${tourId}/history`, label: "History" },
    { key: "discussion", href: `/tours/${tourId}/discussion`, label: "Discussion & review" },
  ] as const;
  return (
    <nav aria-label="Tour" className={cn("flex flex-wrap gap-1 border-b border-line", className)}>
      {items.map((i) => (
        <Link
          key={i.key}
          href={i.href}
          aria-current={current === i.key ? "page" : undefined}
          className={cn(
            "-mb-px border-b-2 px-3 py-2 text-sm transition-colors",
            current === i.key ? "border-accent font-medium text-ink" : "border-transparent text-muted hover:text-ink",
          )}
        >
          {i.label}
        </Link>
      ))}
    </nav>
  );
}
