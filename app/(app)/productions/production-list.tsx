"use client";

import Link from "next/link";
import { useProductions } from "@/hooks/use-productions";
import { ROLE_LABELS } from "@/lib/auth/roles";

export function ProductionList() {
  const { data, isPending, error } = useProductions();
  if (isPending) return <p className="text-muted">Loading productions…</p>;
  if (error)
    return (
      <p role="alert" className="text-danger">
        {error.message}
      </p>
    );
  if (data.length === 0)
    return (
      <p className="text-muted">
        You are not on any production yet. Start one below, or ask a production&apos;s owner to invite you.
      </p>
    );
  return (
    <ul className="grid gap-3 sm:grid-cols-2" data-testid="production-list">
      {data.map((p) => (
        <li key={p.id}>
          <Link
            href={`/productions/${p.id}${p.role === "stage_manager" ? "/cues" : ""}`}
            className="block rounded-lg border border-line bg-surface p-4 hover:border-accent"
          >
            <span className="block text-lg font-semibold">{p.name}</span>
            <span className="block text-sm text-muted">{p.venue || "No venue set"}</span>
            <span className="mt-2 block text-xs text-muted">
              {ROLE_LABELS[p.role]}
              {p.isOwner ? " · owner" : ""} · {p.fixtureCount} fixtures · {p.displayUnits}
            </span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
