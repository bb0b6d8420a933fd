import type { Metadata } from "next";
import Link from "next/link";
import { getCurrentUser } from "@/lib/auth/session";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { LINK_REFUSALS, lookUpInvitation } from "@/lib/data/invitations";
import { AcceptForm } from "./accept-form";

export const metadata: Metadata = { title: "Invitation" };
export const dynamic = "force-dynamic";

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const look = await lookUpInvitation(token);
  if (look.state !== "open") {
    // A clear page and nothing else: no form, nobody signed in.
    return (
      <section className="rounded-lg border border-line bg-surface p-6" aria-labelledby="invite-title">
        <h1 id="invite-title" className="mb-2 text-xl font-semibold">
          {look.state === "expired"
            ? "This invitation has expired"
            : look.state === "used"
              ? "This invitation was already used"
              : look.state === "withdrawn"
                ? "This invitation was withdrawn"
                : "This link does not work"}
        </h1>
        <p className="text-sm text-muted">{LINK_REFUSALS[look.state]}</p>
        <p className="mt-5 text-sm">
          <Link href="/sign-in" className="text-accent underline">
            Go to sign-in
          </Link>
        </p>
      </section>
    );
  }
  const user = await getCurrentUser();
  return (
    <section className="rounded-lg border border-line bg-surface p-6" aria-labelledby="invite-title">
      <h1 id="invite-title" className="mb-1 text-xl font-semibold">
        Join {look.productionName}
      </h1>
      <p className="mb-5 text-sm text-muted">
        You are invited as <strong>{ROLE_LABELS[look.role].toLowerCase()}</strong> ({look.email}).
      </p>
      {user ? (
        <AcceptForm token={token} mode={{ kind: "signed-in", name: user.name, email: user.email }} />
      ) : look.accountExists ? (
        <p className="text-sm">
          An account already uses {look.email}.{" "}
          <Link href="/sign-in" className="text-accent underline">
            Sign in
          </Link>{" "}
          with it, then open this link again to join.
        </p>
      ) : (
        <AcceptForm token={token} mode={{ kind: "new", email: look.email }} />
      )}
    </section>
  );
}
