import type { Metadata } from "next";
import Link from "next/link";
import { lookUpPasswordReset, RESET_REFUSALS } from "@/lib/data/password-resets";
import { CompleteResetForm } from "./complete-form";

export const metadata: Metadata = { title: "Choose a new password" };
export const dynamic = "force-dynamic";

export default async function CompleteResetPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const state = await lookUpPasswordReset(token);
  return (
    <section className="rounded-lg border border-line bg-surface p-6">
      {state === "open" ? (
        <>
          <h1 className="mb-1 text-xl font-semibold">Choose a new password</h1>
          <p className="mb-5 text-sm text-muted">Saving it signs this account out on every other device.</p>
          <CompleteResetForm token={token} />
        </>
      ) : (
        <>
          <h1 className="mb-2 text-xl font-semibold">This link does not work</h1>
          <p className="text-sm text-muted">{RESET_REFUSALS[state]}</p>
          <p className="mt-5 text-sm">
            <Link href="/reset-password" className="text-accent underline">
              Ask for a new link
            </Link>
          </p>
        </>
      )}
    </section>
  );
}
