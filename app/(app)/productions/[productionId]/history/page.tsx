import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { memberForPage } from "@/lib/auth/page-guards";
import { AppError } from "@/lib/errors";
import { getHistory } from "@/lib/data/change-history";
import { getHistorySubjectName } from "@/lib/data/history-subject";
import { showValue } from "@/lib/revisions/history-lines";
import { historyQuerySchema } from "@/lib/revisions/schemas";
import { Card } from "@/components/ui/card";

export const metadata: Metadata = { title: "History" };
export const dynamic = "force-dynamic";

const BACK: Record<string, { tab: string; words: string }> = {
  fixture: { tab: "rig", words: "Back to the rig" },
  position: { tab: "plot", words: "Back to the plot" },
  cue: { tab: "cues", words: "Back to the cues" },
  fixtureType: { tab: "rig", words: "Back to the rig" },
};

/** A unit's, position's, cue's or type's history, newest first: a line per field changed. */
export default async function HistoryPage({
  params,
  searchParams,
}: {
  params: Promise<{ productionId: string }>;
  searchParams: Promise<Record<string, string | undefined>>;
}) {
  const { productionId } = await memberForPage((await params).productionId);
  const q = historyQuerySchema.safeParse(await searchParams);
  if (!q.success) notFound();
  const { entity, id } = q.data;
  const lines = await getHistory({ productionId, entity, id }).catch((err) => {
    if (err instanceof AppError && err.code === "not_found") notFound();
    throw err;
  });
  const name = (await getHistorySubjectName({ productionId, entity, id })) ?? `a deleted ${entity}`;
  const back = BACK[entity];
  return (
    <main className="mx-auto flex max-w-5xl flex-col gap-4 px-4 py-6">
      <p className="text-sm print:hidden">
        <Link href={`/productions/${productionId}/${back.tab}`} className="text-accent underline">
          {back.words}
        </Link>
      </p>
      <Card title={`History of ${name}`}>
        {lines.length === 0 ? (
          <p className="text-sm text-muted">No change has been recorded yet.</p>
        ) : (
          <table className="w-full text-sm" aria-label={`History of ${name}`}>
            <thead className="text-left text-xs uppercase tracking-wide text-muted">
              <tr>
                <th scope="col">When (UTC)</th>
                <th scope="col">Who</th>
                <th scope="col">Field</th>
                <th scope="col">Before</th>
                <th scope="col">After</th>
              </tr>
            </thead>
            <tbody>
              {lines.map((l) => (
                <tr key={`${l.entryId}-${l.field}`} className="border-t border-line align-top">
                  <td className="whitespace-nowrap py-1 pr-2">{l.at.slice(0, 16).replace("T", " ")}</td>
                  <td className="pr-2">{l.who ?? "someone since removed"}</td>
                  <td className="pr-2">
                    {l.label}
                    {l.restoredFrom ? (
                      <span className="block text-xs text-muted">restored from revision {l.restoredFrom}</span>
                    ) : null}
                  </td>
                  <td className="pr-2 text-muted">{l.action === "update" ? showValue(l.before) : ""}</td>
                  <td>{l.action === "update" ? showValue(l.after) : ""}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </Card>
    </main>
  );
}
