import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { getCurrentUser } from "@/lib/auth/session";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { getInvitationsForAddress } from "@/lib/data/pending-invitations";
import { JoinForm } from "./join-form";

export const metadata: Metadata = { title: "Welcome" };
export const dynamic = "force-dynamic";

/** A new account's first stop: the productions that invited its address, or starting one of its own. */
export default async function WelcomePage() {
  const user = await getCurrentUser();
  if (!user) redirect("/sign-in");
  const invitations = await getInvitationsForAddress({ email: user.email });
  return (
    <section className="rounded-lg border border-line bg-surface p-6" aria-labelledby="welcome-title">
      <h1 id="welcome-title" className="mb-1 text-xl font-semibold">
        Welcome, {user.name}
      </h1>
      <p className="mb-5 text-sm text-muted">Your account for {user.email} is ready.</p>
      {invitations.length ? (
        <>
          <h2 className="mb-2 font-medium">Invitations waiting for you</h2>
          <ul className="mb-5 flex flex-col divide-y divide-line">
            {invitations.map((inv) => (
              <li key={inv.id} className="flex items-center justify-between gap-3 py-3 text-sm">
                <span>
                  <span className="font-medium">{inv.productionName}</span> as {ROLE_LABELS[inv.role].toLowerCase()}
                  {inv.invitedBy ? <span className="text-muted"> · from {inv.invitedBy}</span> : null}
                </span>
                <JoinForm invitationId={inv.id} productionName={inv.productionName} />
              </li>
            ))}
          </ul>
        </>
      ) : (
        <p className="mb-5 text-sm">
          No production has invited {user.email} yet. When one does, the invitation arrives by e-mail and shows here.
        </p>
      )}
      <p className="text-sm">
        <Link href="/productions" className="text-accent underline">
          Start a production of your own
        </Link>
      </p>
    </section>
  );
}
