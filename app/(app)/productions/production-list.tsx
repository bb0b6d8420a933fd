"use client";

import Link from "next/link";
import { useState } from "react";
import { useProductions } from "@/hooks/use-productions";
import { useArchiveProduction } from "@/hooks/use-production-lifecycle";
import { ROLE_LABELS } from "@/lib/auth/roles";
import type { ProductionListItem } from "@/lib/dto/production";
import { ApiError } from "@/lib/http/api-client";
import { Button } from "@/components/ui/button";
import { DeleteProduction } from "./delete-production";

export function ProductionList() {
  const { data, isPending, error } = useProductions();
  if (isPending) return <p className="text-muted">Loading productions…</p>;
  if (error)
    return (
      <p role="alert" className="text-danger">
        {error.message}
      </p>
    );
  const active = data.filter((p) => !p.archivedAt);
  const archived = data.filter((p) => p.archivedAt);
  return (
    <>
      {active.length === 0 ? (
        <p className="text-muted">
          {archived.length
            ? "Every production you are on is archived (below). Start one below, or restore one."
            : "You are not on any production yet. Start one below, or ask a production's owner to invite you."}
        </p>
      ) : (
        <ul className="grid gap-3 sm:grid-cols-2" data-testid="production-list">
          {active.map((p) => (
            <ProductionCard key={p.id} production={p} />
          ))}
        </ul>
      )}
      {archived.length ? (
        <details className="rounded-lg border border-line p-3" data-testid="archived-productions">
          <summary className="cursor-pointer font-medium">Archived ({archived.length})</summary>
          <p className="mt-1 text-xs text-muted">
            Archived productions keep everything; they are only off the list above. Their owner can restore or delete
            them.
          </p>
          <ul className="mt-3 grid gap-3 sm:grid-cols-2">
            {archived.map((p) => (
              <ProductionCard key={p.id} production={p} />
            ))}
          </ul>
        </details>
      ) : null}
    </>
  );
}

function ProductionCard({ production: p }: { production: ProductionListItem }) {
  const archive = useArchiveProduction();
  const [deleting, setDeleting] = useState(false);
  const problem = archive.error instanceof ApiError ? archive.error.message : archive.error ? "Could not save." : null;
  return (
    <li className="flex flex-col rounded-lg border border-line bg-surface" data-testid="production-card">
      <Link
        href={`/productions/${p.id}${p.role === "stage_manager" ? "/cues" : ""}`}
        className="block rounded-t-lg p-4 hover:bg-raised"
      >
        <span className="block text-lg font-semibold">{p.name}</span>
        <span className="block text-sm text-muted">{p.venue || "No venue set"}</span>
        <span className="mt-2 block text-xs text-muted">
          {ROLE_LABELS[p.role]}
          {p.isOwner ? " · owner" : ""} · {p.fixtureCount} fixtures · {p.displayUnits}
          {p.archivedAt ? ` · archived ${p.archivedAt.slice(0, 10)}` : ""}
        </span>
      </Link>
      {p.isOwner ? (
        <div className="flex flex-wrap items-center gap-2 border-t border-line px-4 py-2">
          <Button
            variant="secondary"
            disabled={archive.isPending}
            onClick={() => archive.mutate({ id: p.id, archived: !p.archivedAt })}
            aria-label={`${p.archivedAt ? "Restore" : "Archive"} ${p.name}`}
          >
            {p.archivedAt ? "Restore" : "Archive"}
          </Button>
          <Button variant="quiet" onClick={() => setDeleting(true)} aria-label={`Delete ${p.name}…`}>
            Delete…
          </Button>
          {problem ? (
            <span role="alert" className="text-sm text-danger">
              {problem}
            </span>
          ) : null}
        </div>
      ) : null}
      {deleting ? <DeleteProduction production={p} onClose={() => setDeleting(false)} /> : null}
    </li>
  );
}
