"use client";
// Issuing a revision: a label (empty: the next free letter), what it is for, a note, the shop's spares.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiError, apiFetch } from "@/lib/http/api-client";
import { REVISION_PURPOSES } from "@/models/revision-purposes";
import { TextField } from "@/components/ui/text-field";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";

const PURPOSE_LABELS: Record<(typeof REVISION_PURPOSES)[number], string> = {
  bid: "Bid",
  hang: "Hang",
  focus: "Focus",
  tech: "Tech",
  archive: "Archive",
};

type Issued = {
  revision: { id: number; label: string };
  mail: { queued: number } | { error: string };
};

export function IssueForm({ productionId, nextLetter }: { productionId: number; nextLetter: string }) {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<{ text: string; tone: "ok" | "error" } | null>(null);

  async function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const spares = String(form.get("sparesPercent") ?? "").trim();
    setPending(true);
    setErrors({});
    setMessage(null);
    try {
      const r = await apiFetch<Issued>(`/api/productions/${productionId}/revisions`, {
        method: "POST",
        json: {
          label: String(form.get("label") ?? ""),
          issuedFor: String(form.get("issuedFor")),
          note: String(form.get("note") ?? ""),
          ...(spares ? { sparesPercent: Number(spares) } : {}),
        },
      });
      const mail =
        "error" in r.mail
          ? r.mail.error
          : `${r.mail.queued} e-mail${r.mail.queued === 1 ? "" : "s"} queued for the team.`;
      setMessage({ text: `Revision ${r.revision.label} issued. ${mail}`, tone: "error" in r.mail ? "error" : "ok" });
      (e.target as HTMLFormElement).reset();
      router.push(`/productions/${productionId}/revisions?revision=${r.revision.id}`);
      router.refresh();
    } catch (err) {
      if (err instanceof ApiError) {
        setErrors(err.fieldErrors);
        setMessage({ text: err.message, tone: "error" });
      } else setMessage({ text: "The revision could not be issued; check the connection.", tone: "error" });
    } finally {
      setPending(false);
    }
  }

  return (
    <form onSubmit={submit} className="flex flex-wrap items-end gap-3" noValidate aria-label="Issue a revision">
      <TextField
        label="Letter or label"
        name="label"
        placeholder={nextLetter}
        hint={`Empty: ${nextLetter}`}
        maxLength={40}
        className="w-36"
        error={errors.label}
      />
      <div className="flex flex-col gap-1 text-sm">
        <label htmlFor="issued-for" className="font-medium">
          Issued for
        </label>
        <select
          id="issued-for"
          name="issuedFor"
          defaultValue="hang"
          className="min-h-10 rounded-md border border-line bg-surface px-3 text-ink"
        >
          {REVISION_PURPOSES.map((p) => (
            <option key={p} value={p}>
              {PURPOSE_LABELS[p]}
            </option>
          ))}
        </select>
      </div>
      <TextField label="Note" name="note" maxLength={4000} className="min-w-56 flex-1" error={errors.note} />
      <TextField
        label="Shop spares %"
        name="sparesPercent"
        type="number"
        min={0}
        max={100}
        step={1}
        placeholder="10"
        className="w-28"
        error={errors.sparesPercent}
      />
      <Button type="submit" disabled={pending}>
        {pending ? "Issuing…" : "Issue revision"}
      </Button>
      <div className="basis-full">
        <FormMessage message={message?.text} tone={message?.tone} />
      </div>
    </form>
  );
}
