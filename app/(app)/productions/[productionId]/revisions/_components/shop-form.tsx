"use client";
// The owner names the rental shop's address that receives the add / return list with each revision.
import { useState } from "react";
import { ApiError, apiFetch } from "@/lib/http/api-client";
import { TextField } from "@/components/ui/text-field";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";

export function ShopForm({ productionId, shopEmail }: { productionId: number; shopEmail: string | null }) {
  const [message, setMessage] = useState<{ text: string; tone: "ok" | "error" } | null>(null);
  const [errors, setErrors] = useState<string[] | undefined>();
  async function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const value = String(new FormData(e.currentTarget).get("shopEmail") ?? "").trim();
    try {
      await apiFetch(`/api/productions/${productionId}/revisions/shop`, { method: "PUT", json: { shopEmail: value } });
      setErrors(undefined);
      setMessage({ text: value ? `The shop's list goes to ${value}.` : "No shop gets the list.", tone: "ok" });
    } catch (err) {
      setErrors(err instanceof ApiError ? err.fieldErrors.shopEmail : undefined);
      setMessage({ text: err instanceof Error ? err.message : "Not saved.", tone: "error" });
    }
  }
  return (
    <form onSubmit={submit} className="flex flex-wrap items-end gap-3" noValidate aria-label="Rental shop contact">
      <TextField
        label="Rental shop e-mail"
        name="shopEmail"
        type="email"
        defaultValue={shopEmail ?? ""}
        hint="Gets the equipment add / return list with each revision. Empty: nobody."
        className="min-w-64 flex-1"
        error={errors}
      />
      <Button type="submit" variant="secondary">
        Save
      </Button>
      <div className="basis-full">
        <FormMessage message={message?.text} tone={message?.tone} />
      </div>
    </form>
  );
}
