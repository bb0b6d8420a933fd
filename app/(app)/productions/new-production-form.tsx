"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { useCreateProduction } from "@/hooks/use-productions";
import { ApiError } from "@/lib/http/api-client";
import { Card } from "@/components/ui/card";
import { TextField } from "@/components/ui/text-field";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";

export function NewProductionForm() {
  const router = useRouter();
  const create = useCreateProduction();
  const [units, setUnits] = useState<"metric" | "imperial">("metric");
  const fieldErrors = create.error instanceof ApiError ? create.error.fieldErrors : {};

  function submit(form: FormData) {
    create.mutate(
      { name: String(form.get("name") ?? ""), venue: String(form.get("venue") ?? ""), displayUnits: units },
      { onSuccess: (p) => router.push(`/productions/${p.id}/settings`) },
    );
  }

  return (
    <Card title="Start a production">
      <form action={submit} className="grid gap-3 sm:grid-cols-[1fr_1fr_auto_auto] sm:items-start" noValidate>
        <TextField label="Production name" name="name" required error={fieldErrors.name} />
        <TextField label="Venue" name="venue" error={fieldErrors.venue} />
        <fieldset className="flex flex-col gap-1 text-sm">
          <legend className="font-medium">Units</legend>
          <div className="flex min-h-10 items-center gap-3">
            {(["metric", "imperial"] as const).map((u) => (
              <label key={u} className="flex items-center gap-1">
                <input type="radio" name="units" checked={units === u} onChange={() => setUnits(u)} /> {u}
              </label>
            ))}
          </div>
        </fieldset>
        <Button type="submit" className="sm:mt-6" disabled={create.isPending}>
          {create.isPending ? "Creating…" : "Create"}
        </Button>
      </form>
      <FormMessage message={create.error && !Object.keys(fieldErrors).length ? create.error.message : null} />
    </Card>
  );
}
