import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { memberForPage } from "@/lib/auth/page-guards";
import { mailForProduction } from "@/lib/data/mail-queue";
import { Card } from "@/components/ui/card";
import { RetryButton } from "./retry-button";

export const metadata: Metadata = { title: "Outbox" };
export const dynamic = "force-dynamic";

/** The owner's view of the production's mail: what went out, and what waits in the queue with the reason. */
export default async function OutboxPage({ params }: { params: Promise<{ productionId: string }> }) {
  const raw = (await params).productionId;
  const { productionId, member } = await memberForPage(raw);
  if (!member.isOwner) notFound();
  const mail = await mailForProduction(productionId);
  const waiting = mail.filter((m) => m.status === "queued").length;
  return (
    <main className="mx-auto flex max-w-4xl flex-col gap-4 px-4 py-6">
      <p className="text-sm">
        <Link href={`/productions/${productionId}/team`} className="text-accent underline">
          Back to the team
        </Link>
      </p>
      <Card title="Outbox" actions={waiting ? <RetryButton productionId={productionId} /> : undefined}>
        <p className="mb-3 text-sm text-muted">
          {waiting
            ? `${waiting} message${waiting === 1 ? " waits" : "s wait"} for the mail server; they are retried automatically.`
            : "Every message has been handed to the mail server."}
        </p>
        {mail.length === 0 ? (
          <p className="text-sm text-muted">Nothing has been sent for this production yet.</p>
        ) : null}
        <ul className="flex flex-col divide-y divide-line">
          {mail.map((m) => (
            <li key={m.id} className="py-3 text-sm">
              <details>
                <summary className="cursor-pointer">
                  <span className="font-medium">{m.subject}</span> → {m.to}
                  <span className="text-xs text-muted">
                    {" "}
                    · {new Date(m.createdAt).toUTCString().slice(5, 22)} ·{" "}
                    {m.status === "sent" ? (
                      "sent"
                    ) : (
                      <span className="text-danger">
                        queued after {m.attempts} attempt{m.attempts === 1 ? "" : "s"}
                      </span>
                    )}
                  </span>
                </summary>
                {m.lastError ? <p className="mt-2 text-xs text-danger">{m.lastError}</p> : null}
                <pre className="mt-2 whitespace-pre-wrap rounded-md bg-raised p-3 text-xs">{m.text}</pre>
              </details>
            </li>
          ))}
        </ul>
      </Card>
    </main>
  );
}
