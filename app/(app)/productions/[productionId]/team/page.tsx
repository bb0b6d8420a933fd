import type { Metadata } from "next";
import { memberForPage } from "@/lib/auth/page-guards";
import { getTeamByProduction } from "@/lib/data/memberships";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { can } from "@/lib/auth/policy";
import { Card } from "@/components/ui/card";

export const metadata: Metadata = { title: "Team" };

export default async function TeamPage({ params }: { params: Promise<{ productionId: string }> }) {
  const { productionId, member } = await memberForPage((await params).productionId);
  const team = await getTeamByProduction({ productionId });
  return (
    <main className="mx-auto max-w-3xl px-4 py-6">
      <Card title="Team">
        <table className="w-full text-sm">
          <thead className="text-left text-xs uppercase tracking-wide text-muted">
            <tr>
              <th className="py-1">Name</th>
              <th>E-mail</th>
              <th>Role</th>
            </tr>
          </thead>
          <tbody>
            {team.map((m) => (
              <tr key={m.userId} className="border-t border-line">
                <td className="py-2">{m.name}</td>
                <td className="text-muted">{m.email}</td>
                <td>
                  {ROLE_LABELS[m.role]}
                  {m.isOwner ? " · owner" : ""}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
        <p className="mt-4 text-xs text-muted">
          {can(member, "team.manage")
            ? "Invitations and role changes arrive in a later release; for now the team is set when the production is created."
            : "Only the production's owner can invite people and change roles."}
        </p>
      </Card>
    </main>
  );
}
