import type { Metadata } from "next";
import Link from "next/link";
import { memberForPage } from "@/lib/auth/page-guards";
import { getTeam } from "@/lib/data/team";
import { getOpenInvitations } from "@/lib/data/invitations";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { can } from "@/lib/auth/policy";
import { Card } from "@/components/ui/card";
import { getRevisionMailChoices } from "@/lib/data/revision-mail-settings";
import { RevisionMailToggle } from "@/components/revisions/revision-mail-toggle";
import { InviteForm } from "./_components/invite-form";
import { InvitationForms, RemoveForm, RoleForm } from "./_components/row-forms";

export const metadata: Metadata = { title: "Team" };

export default async function TeamPage({ params }: { params: Promise<{ productionId: string }> }) {
  const { productionId, member, user } = await memberForPage((await params).productionId);
  const manages = can(member, "team.manage");
  const [team, invitations, mailChoices] = await Promise.all([
    getTeam({ productionId }),
    manages ? getOpenInvitations({ productionId }) : Promise.resolve([]),
    getRevisionMailChoices({ productionId }),
  ]);
  return (
    <main className="mx-auto flex max-w-4xl flex-col gap-4 px-4 py-6">
      <Card title="Team">
        <table className="w-full text-sm">
          <thead className="text-left text-xs uppercase tracking-wide text-muted">
            <tr>
              <th scope="col" className="py-1">
                Name
              </th>
              <th scope="col">E-mail</th>
              <th scope="col">Role</th>
              {manages ? (
                <th scope="col">
                  <span className="sr-only">Remove</span>
                </th>
              ) : null}
            </tr>
          </thead>
          <tbody>
            {team.map((m) => (
              <tr key={m.userId} className="border-t border-line align-middle">
                <td className="py-2">
                  {m.name}
                  {m.userId === user.id ? <span className="text-muted"> (you)</span> : null}
                </td>
                <td className="text-muted">{m.email}</td>
                <td>
                  {manages ? (
                    <RoleForm
                      productionId={productionId}
                      memberId={m.userId}
                      role={m.role}
                      version={m.version}
                      name={m.name}
                    />
                  ) : (
                    ROLE_LABELS[m.role]
                  )}
                  {m.isOwner ? <span className="text-xs text-muted"> · owner</span> : null}
                </td>
                {manages ? (
                  <td>{<RemoveForm productionId={productionId} memberId={m.userId} name={m.name} />}</td>
                ) : null}
              </tr>
            ))}
          </tbody>
        </table>
        <div className="mt-4 border-t border-line pt-3">
          <RevisionMailToggle productionId={productionId} initial={mailChoices[user.id] ?? true} />
          <p className="text-xs text-muted">
            Revision e-mail turned off by:{" "}
            {team
              .filter((m) => mailChoices[m.userId] === false)
              .map((m) => m.name)
              .join(", ") || "nobody"}
            .
          </p>
        </div>
        {manages ? null : (
          <p className="mt-4 text-xs text-muted">
            Only the production&apos;s owner can invite people and change roles.
          </p>
        )}
      </Card>
      {manages ? (
        <>
          <Card title="Invite someone">
            <p className="mb-3 text-sm text-muted">
              They receive an e-mail with a link that works once and expires after a week.
            </p>
            <InviteForm productionId={productionId} />
          </Card>
          <Card
            title="Open invitations"
            actions={
              <Link href={`/productions/${productionId}/team/outbox`} className="text-sm text-accent underline">
                Outbox
              </Link>
            }
          >
            {invitations.length === 0 ? (
              <p className="text-sm text-muted">No invitations are waiting.</p>
            ) : (
              <ul className="flex flex-col divide-y divide-line text-sm">
                {invitations.map((i) => (
                  <li key={i.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
                    <span>
                      {i.email} · {ROLE_LABELS[i.role]}
                      <span className="text-xs text-muted">
                        {" "}
                        · expires {new Date(i.expiresAt).toUTCString().slice(0, 16)}
                      </span>
                    </span>
                    <InvitationForms productionId={productionId} invitationId={i.id} email={i.email} />
                  </li>
                ))}
              </ul>
            )}
          </Card>
        </>
      ) : null}
    </main>
  );
}
