"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { GybeMark } from "@/components/brand/gybe-mark";
import { cn } from "@/components/ui/cn";
import type { ShellRole, ShellUser } from "./types";
import { UserMenu } from "./user-menu";

export type { ShellUser };

interface NavItem {
  href: string;
  label: string;
  /** Roles that see the link; all roles when omitted. */
  roles?: readonly ShellRole[];
}

const NAV: readonly NavItem[] = [
  { href: "/tours", label: "Tours" },
  { href: "/compare", label: "Compare" },
  { href: "/catalog", label: "Catalog" },
  { href: "/team", label: "Team", roles: ["lead"] },
  { href: "/outbox", label: "Outbox", roles: ["lead"] },
];

function isActive(pathname: string, href: string): boolean {
  return pathname === href || pathname.startsWith(`${href}/`);
}

export interface AppNavProps {
  user: ShellUser;
}

/** The signed-in top bar: mark, section links (Team and Outbox for leads only) and the user menu. */
export function AppNav({ user }: AppNavProps) {
  const pathname = usePathname() ?? "";
  const items = NAV.filter((i) => !i.roles || i.roles.includes(user.role));
  return (
    <header className="sticky top-0 z-40 border-b border-line bg-canvas/85 backdrop-blur supports-[backdrop-filter]:bg-canvas/70">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-50 focus:rounded-md focus:bg-accent focus:px-3 focus:py-1.5 focus:text-sm focus:text-accent-ink"
      >
        Skip to content
      </a>
      <div className="mx-auto flex h-14 max-w-screen-2xl items-center gap-4 px-4 sm:px-6">
        <Link href="/tours" className="flex shrink-0 items-center gap-2 rounded-md" aria-label="Gybe — Tours">
          <GybeMark size={26} />
          <span className="hidden text-base font-semibold tracking-tight text-ink sm:inline">Gybe</span>
        </Link>
        <span aria-hidden className="hidden h-5 w-px bg-line sm:block" />
        <nav aria-label="Main" className="flex h-full min-w-0 flex-1 items-stretch gap-0.5 overflow-x-auto">
          {items.map((item) => {
            const active = isActive(pathname, item.href);
            return (
              <Link
                key={item.href}
                href={item.href}
                aria-current={active ? "page" : undefined}
                className={cn(
                  "group relative flex items-center px-1 text-sm whitespace-nowrap",
                  active ? "font-medium text-ink" : "text-muted hover:text-ink",
                )}
              >
                <span
                  className={cn(
                    "rounded-md px-2.5 py-1.5 transition-colors",
                    active ? "bg-raised" : "group-hover:bg-raised/60",
                  )}
                >
                  {item.label}
                </span>
                {active ? (
                  <span aria-hidden className="absolute inset-x-2 bottom-0 h-0.5 rounded-full bg-accent" />
                ) : null}
              </Link>
            );
          })}
        </nav>
        <UserMenu user={user} className="shrink-0" />
      </div>
    </header>
  );
}
