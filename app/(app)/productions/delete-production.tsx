"use client";

import { useEffect, useRef, useState } from "react";
import { useDeleteProduction } from "@/hooks/use-production-lifecycle";
import type { ProductionListItem } from "@/lib/dto/production";
import { ApiError } from "@/lib/http/api-client";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/text-field";

const norm = (s: string) => s.trim().toLowerCase();

/** Deleting asks for the production's name typed, says what goes with it, and cannot be undone. */
export function DeleteProduction({ production, onClose }: { production: ProductionListItem; onClose: () => void }) {
  const ref = useRef<HTMLDialogElement>(null);
  const remove = useDeleteProduction();
  const [typed, setTyped] = useState("");
  const matches = norm(typed) === norm(production.name);
  const fieldErrors = remove.error instanceof ApiError ? remove.error.fieldErrors : {};

  useEffect(() => {
    ref.current?.showModal();
  }, []);

  return (
    <dialog
      ref={ref}
      onClose={onClose}
      aria-labelledby={`delete-${production.id}-title`}
      className="m-auto max-w-md rounded-lg border border-line bg-surface p-5 text-ink backdrop:bg-black/50"
      data-testid="delete-production-dialog"
    >
      <form
        method="dialog"
        className="flex flex-col gap-3"
        onSubmit={(e) => {
          e.preventDefault();
          if (!matches) return;
          remove.mutate({ id: production.id, confirmName: typed }, { onSuccess: () => ref.current?.close() });
        }}
      >
        <h2 id={`delete-${production.id}-title`} className="text-lg font-semibold">
          Delete {production.name}?
        </h2>
        <p className="text-sm">
          This removes the production for everyone on its team: positions, fixtures, focus, cues, notes, revisions,
          uploaded files and its change history. It cannot be undone. To keep it out of the way instead, archive it.
        </p>
        <TextField
          label={`Type the production's name (${production.name}) to confirm`}
          name={`confirm-${production.id}`}
          autoComplete="off"
          value={typed}
          onChange={(e) => setTyped(e.target.value)}
          error={fieldErrors.confirmName}
        />
        {remove.error && !fieldErrors.confirmName ? (
          <p role="alert" className="text-sm text-danger">
            {remove.error.message}
          </p>
        ) : null}
        <div className="flex justify-end gap-2">
          <Button type="button" variant="secondary" onClick={() => ref.current?.close()}>
            Keep it
          </Button>
          <Button type="submit" variant="danger" disabled={!matches || remove.isPending}>
            {remove.isPending ? "Deleting…" : "Delete for good"}
          </Button>
        </div>
      </form>
    </dialog>
  );
}
