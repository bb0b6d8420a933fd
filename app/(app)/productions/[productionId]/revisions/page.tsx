import type { Metadata } from "next";
import Link from "next/link";
import { memberForPage } from "@/lib/auth/page-guards";
import { can } from "@/lib/auth/policy";
import {
  compareRevisions,
  getPreviousRevisionId,
  getRevisionsByProduction,
  getRowVersions,
  getSnapshot,
} from "@/lib/data/revisions";
import { DEFAULT_SPARES_PERCENT, getEquipment } from "@/lib/data/revision-equipment";
import { getShopEmail } from "@/lib/data/revision-mail-settings";
import { diffSnapshots } from "@/lib/revisions/diff";
import { nextLetter } from "@/lib/revisions/letters";
import { purposeWords } from "@/lib/revisions/summary-text";
import { sparesSchema } from "@/lib/revisions/schemas";
import type { RevisionDto } from "@/lib/revisions/types";
import { Card } from "@/components/ui/card";
import { ChangesList } from "./_components/changes-list";
import { EquipmentCard } from "./_components/equipment-card";
import { IssueForm } from "./_components/issue-form";
import { ShopForm } from "./_components/shop-form";
import { RevisionList } from "./_components/revision-list";

export const metadata: Metadata = { title: "Revisions" };
export const dynamic = "force-dynamic";

type Search = { revision?: string; from?: string; to?: string; of?: string; eqFrom?: string; spares?: string };

/** A revision id from the URL that belongs to this production, "current", or the fallback. */
function pick(raw: string | undefined, revisions: RevisionDto[], fallback: string): string {
  if (raw === "current") return raw;
  return revisions.some((r) => String(r.id) === raw) ? (raw as string) : fallback;
}
const side = (v: string) => (v === "current" ? "current" : Number(v));

export default async function RevisionsPage({
  params,
  searchParams,
}: {
  params: Promise<{ productionId: string }>;
  searchParams: Promise<Search>;
}) {
  const { productionId, member } = await memberForPage((await params).productionId);
  const q = await searchParams;
  const revisions = await getRevisionsByProduction({ productionId });
  const latest = revisions[0];
  const canIssue = can(member, "revisions.issue");

  // The selected revision and what changed in it since the one before.
  const selected = revisions.find((r) => String(r.id) === q.revision) ?? latest;
  let selectedDiff = null;
  if (selected) {
    const previousId = await getPreviousRevisionId({ productionId, revisionId: selected.id });
    selectedDiff = previousId
      ? (await compareRevisions({ productionId, from: previousId, to: selected.id })).diff
      : diffSnapshots(null, (await getSnapshot({ productionId, revision: selected.id })).snapshot);
  }
  const previousOfSelected = selected ? revisions.find((r) => r.sequence < selected.sequence) : undefined;

  // Compare any two; by default the latest revision with the paperwork as it stands.
  const from = pick(q.from, revisions, latest ? String(latest.id) : "current");
  const to = pick(q.to, revisions, "current");
  const comparison = revisions.length ? await compareRevisions({ productionId, from: side(from), to: side(to) }) : null;
  const fromRevision = revisions.find((r) => String(r.id) === from);
  const restore =
    fromRevision && to === "current" && canIssue
      ? await getRowVersions({ productionId }).then((v) => ({
          productionId,
          revisionId: fromRevision.id,
          revisionLabel: fromRevision.label,
          fixtureVersions: v.fixtures,
          cueVersions: v.cues,
        }))
      : undefined;

  const spares = sparesSchema.safeParse(q.spares ?? DEFAULT_SPARES_PERCENT);
  const eq = {
    of: pick(q.of, revisions, "current"),
    from: q.eqFrom ? pick(q.eqFrom, revisions, "") : "",
    spares: String(spares.success ? spares.data : DEFAULT_SPARES_PERCENT),
  };
  const report = await getEquipment({
    productionId,
    of: side(eq.of),
    from: eq.from ? side(eq.from) : undefined,
    sparesPercent: Number(eq.spares),
  });
  const shopEmail = member.isOwner ? await getShopEmail({ productionId }) : null;

  return (
    <main className="mx-auto flex max-w-5xl flex-col gap-4 px-4 py-6 print:max-w-none print:p-0">
      {canIssue ? (
        <Card title="Issue a revision" className="print:hidden">
          <p className="mb-3 text-sm text-muted">
            Takes a copy of the paperwork as it stands (fixtures, positions, types, cues and levels) and e-mails the
            team what changed{latest ? ` since revision ${latest.label}` : ""}.
          </p>
          <IssueForm productionId={productionId} nextLetter={nextLetter(revisions.map((r) => r.label))} />
        </Card>
      ) : null}

      <Card title="Issued revisions">
        <RevisionList productionId={productionId} revisions={revisions} selectedId={selected?.id ?? null} />
      </Card>

      {selected && selectedDiff ? (
        <Card title={`Revision ${selected.label}`}>
          <p className="mb-2 text-sm">
            Issued for {purposeWords(selected.issuedFor)}
            {selected.issuedBy ? ` by ${selected.issuedBy}` : ""} on{" "}
            {new Date(selected.issuedAt).toUTCString().slice(0, 22)} UTC.
            {selected.note ? <span className="block text-muted">Note: {selected.note}</span> : null}
          </p>
          <h3 className="text-sm font-semibold">
            {previousOfSelected
              ? `Changes since revision ${previousOfSelected.label}`
              : "First revision: everything is new"}
          </h3>
          <ChangesList diff={selectedDiff} />
        </Card>
      ) : null}

      {comparison ? (
        <Card title="Compare">
          <form
            key={`${from}-${to}`}
            method="get"
            className="mb-3 flex flex-wrap items-end gap-3 print:hidden"
            aria-label="Compare revisions"
          >
            {(["from", "to"] as const).map((name) => (
              <div key={name} className="flex flex-col gap-1 text-sm">
                <label htmlFor={`compare-${name}`} className="font-medium">
                  {name === "from" ? "From" : "To"}
                </label>
                <select
                  id={`compare-${name}`}
                  name={name}
                  defaultValue={name === "from" ? from : to}
                  className="min-h-10 rounded-md border border-line bg-surface px-3 text-ink"
                >
                  <option value="current">The paperwork now</option>
                  {revisions.map((r) => (
                    <option key={r.id} value={String(r.id)}>
                      Revision {r.label}
                    </option>
                  ))}
                </select>
              </div>
            ))}
            <button type="submit" className="min-h-10 rounded-md border border-line px-4 text-sm hover:bg-raised">
              Compare
            </button>
          </form>
          <h3 className="text-sm font-semibold">
            {comparison.from === "current" ? "The paperwork now" : `Revision ${comparison.from}`} →{" "}
            {comparison.to === "current" ? "the paperwork now" : `revision ${comparison.to}`}
          </h3>
          {restore ? (
            <p className="text-xs text-muted print:hidden">
              A restore puts one unit&apos;s or cue&apos;s values back as revision {restore.revisionLabel} had them, as
              a new change in its history.
            </p>
          ) : null}
          <ChangesList diff={comparison.diff} restore={restore} />
        </Card>
      ) : null}

      <EquipmentCard
        key={`${eq.of}-${eq.from}-${eq.spares}`}
        productionId={productionId}
        revisions={revisions}
        report={report}
        query={eq}
      />

      {member.isOwner ? (
        <Card title="Rental shop" className="print:hidden">
          <ShopForm productionId={productionId} shopEmail={shopEmail} />
          <p className="mt-2 text-xs text-muted">
            Each team member chooses on the{" "}
            <Link href={`/productions/${productionId}/team`} className="text-accent underline">
              team page
            </Link>{" "}
            whether the revision e-mail reaches them.
          </p>
        </Card>
      ) : null}
    </main>
  );
}
