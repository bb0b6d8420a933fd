"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";

export const PRODUCTION_TABS = [
  { slug: "", label: "Overview" },
  { slug: "plot", label: "Plot" },
  { slug: "rig", label: "Rig" },
  { slug: "focus", label: "Focus charts" },
  { slug: "cues", label: "Cues" },
  { slug: "notes", label: "Notes" },
  { slug: "studies", label: "Studies" },
  { slug: "checks", label: "Checks" },
  { slug: "revisions", label: "Revisions" },
  { slug: "team", label: "Team" },
  { slug: "settings", label: "Settings" },
] as const;

export function ProductionTabs({ productionId }: { productionId: number }) {
  const pathname = usePathname();
  const base = `/productions/${productionId}`;
  return (
    <nav aria-label="Production" className="-mb-px mt-2 flex gap-1 overflow-x-auto">
      {PRODUCTION_TABS.map((tab) => {
        const href = tab.slug ? `${base}/${tab.slug}` : base;
        const active = tab.slug ? pathname.startsWith(href) : pathname === base;
        return (
          <Link
            key={tab.slug}
            href={href}
            aria-current={active ? "page" : undefined}
            className={`whitespace-nowrap border-b-2 px-3 py-2 text-sm ${active ? "border-accent font-medium text-ink" : "border-transparent text-muted hover:text-ink"}`}
          >
            {tab.label}
          </Link>
        );
      })}
    </nav>
  );
}
