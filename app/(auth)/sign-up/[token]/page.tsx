import type { Metadata } from "next";
import Link from "next/link";
import { lookUpSignUpLink, SIGN_UP_REFUSALS } from "@/lib/data/sign-ups";
import { FinishSignUpForm } from "./finish-form";

export const metadata: Metadata = { title: "Finish creating your account" };
export const dynamic = "force-dynamic";

const HEADINGS = {
  invalid: "This link does not work",
  used: "This sign-up link was already used",
  expired: "This sign-up link has expired",
} as const;

export default async function FinishSignUpPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const look = await lookUpSignUpLink(token);
  if (look.state !== "open")
    // A clear page and nothing else: no form, nobody signed in.
    return (
      <section className="rounded-lg border border-line bg-surface p-6" aria-labelledby="sign-up-title">
        <h1 id="sign-up-title" className="mb-2 text-xl font-semibold">
          {HEADINGS[look.state]}
        </h1>
        <p className="text-sm text-muted">{SIGN_UP_REFUSALS[look.state]}</p>
        <p className="mt-5 flex gap-4 text-sm">
          <Link href="/sign-up" className="text-accent underline">
            Start again
          </Link>
          <Link href="/sign-in" className="text-accent underline">
            Go to sign-in
          </Link>
        </p>
      </section>
    );
  return (
    <section className="rounded-lg border border-line bg-surface p-6" aria-labelledby="sign-up-title">
      <h1 id="sign-up-title" className="mb-1 text-xl font-semibold">
        Finish creating your account
      </h1>
      <p className="mb-5 text-sm text-muted">
        The account is for <strong>{look.email}</strong>. Choose a password to finish.
      </p>
      <FinishSignUpForm token={token} name={look.name} />
    </section>
  );
}
