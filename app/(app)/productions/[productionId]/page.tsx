import type { Metadata } from "next";
import Link from "next/link";
import { memberForPage } from "@/lib/auth/page-guards";
import { getProductionOverview, requireProduction } from "@/lib/data/productions";
import { getTeamByProduction } from "@/lib/data/memberships";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { formatLength } from "@/lib/optics";
import { Card } from "@/components/ui/card";
import { requireChecksReport } from "@/lib/data/checks";
import { checksStatusLines } from "@/lib/checks/status";
import { getFixtureTypesByProduction } from "@/lib/data/fixture-types";
import { can } from "@/lib/auth/policy";
import { AddTypes } from "@/components/rig/add-types";
import { getLatestRevisionStamp } from "@/lib/data/revisions";
import { revisionStampText } from "@/components/revisions/revision-marks";

// The layout's title template covers the tabs below it, not this page of its own segment.
export async function generateMetadata({ params }: { params: Promise<{ productionId: string }> }): Promise<Metadata> {
  const { productionId } = await memberForPage((await params).productionId);
  return { title: { absolute: `Overview · ${(await requireProduction(productionId)).name} · Throwline` } };
}

export default async function OverviewPage({ params }: { params: Promise<{ productionId: string }> }) {
  const { productionId, member } = await memberForPage((await params).productionId);
  const [production, overview, team, checks, types, revision] = await Promise.all([
    requireProduction(productionId),
    getProductionOverview({ productionId }),
    getTeamByProduction({ productionId }),
    requireChecksReport({ productionId }),
    getFixtureTypesByProduction({ productionId }),
    getLatestRevisionStamp({ productionId }),
  ]);
  // What the checks found, or which of them have nothing to check yet: never a bare all-clear.
  const checkLines = checksStatusLines(checks, {
    fixtures: checks.summary.fixtures,
    patched: checks.summary.fixtures - checks.dmx.unpatched.length,
  });
  const TONE = { error: "text-danger", warning: "text-caution", muted: "text-muted", ok: "text-success" } as const;
  const { counts } = overview;
  const len = (m: number) => formatLength(m, production.displayUnits);
  const stats: Array<[string, number | string, string]> = [
    ["Positions", counts.positions, "plot"],
    ["Fixtures", counts.fixtures, "rig"],
    ["Hung", `${counts.hung} / ${counts.fixtures}`, "rig"],
    ["Focused", `${counts.focused} / ${counts.fixtures}`, "focus"],
    ["Focus points", counts.focusPoints, "plot"],
    ["Cues", counts.cues, "cues"],
  ];
  return (
    <main className="mx-auto grid max-w-6xl gap-4 px-4 py-6 lg:grid-cols-3">
      {types.length === 0 ? (
        // A new production has no fixture types, so nothing can be hung yet: offer a start.
        <Card title="No fixture types yet" className="lg:col-span-3">
          {can(member, "plot.edit") ? (
            <AddTypes productionId={productionId} existingNames={[]} />
          ) : (
            <p className="text-sm text-muted">The designer adds fixture types before units can be hung.</p>
          )}
        </Card>
      ) : null}
      <Card title="Where things stand" className="lg:col-span-2">
        {/* A list of links (a link may not sit between a term and its description list). */}
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3" data-testid="overview-counts">
          {stats.map(([label, value, tab]) => (
            <li key={label}>
              <Link
                href={`/productions/${productionId}/${tab}`}
                className="block rounded-md border border-line p-3 hover:border-accent"
              >
                <span className="block text-xs uppercase tracking-wide text-muted">{label}</span>
                <span className="block text-2xl font-semibold tabular-nums">{value}</span>
              </Link>
            </li>
          ))}
        </ul>
      </Card>
      <Card title="Warnings">
        <ul className="list-disc pl-5 text-sm" data-testid="overview-warnings">
          {checkLines.map((l) => (
            <li key={l.text} className={TONE[l.tone]}>
              {l.tone === "error" || l.tone === "warning" ? (
                <Link href={`/productions/${productionId}/checks`} className="underline">
                  {l.text}
                </Link>
              ) : (
                l.text
              )}
            </li>
          ))}
          {overview.warnings.map((w) => (
            <li key={w} className="text-caution">
              {w}
            </li>
          ))}
        </ul>
        <p className="mt-3 text-xs text-muted">
          Latest revision:{" "}
          <Link href={`/productions/${productionId}/revisions`} className="text-accent underline">
            {revision ? revisionStampText(revision) : "none issued yet"}
          </Link>
        </p>
      </Card>
      <Card title="Stage" className="lg:col-span-2">
        <p className="text-sm">
          Proscenium {len(production.prosceniumWidth)} wide × {len(production.prosceniumHeight)} high; stage{" "}
          {len(production.stageWidth)} wide and {len(production.stageDepth)} deep from the {production.datumName}; back
          wall {len(production.backWallY)} upstage of it. Head height for focusing {len(production.headHeight)}.
        </p>
      </Card>
      <Card title="Team">
        <ul className="flex flex-col gap-1 text-sm" data-testid="overview-team">
          {team.map((m) => (
            <li key={m.userId} className="flex justify-between gap-2">
              <span>{m.name}</span>
              <span className="text-muted">
                {ROLE_LABELS[m.role]}
                {m.isOwner ? " · owner" : ""}
              </span>
            </li>
          ))}
        </ul>
      </Card>
    </main>
  );
}
