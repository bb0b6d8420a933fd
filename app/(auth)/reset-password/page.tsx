import type { Metadata } from "next";
import Link from "next/link";
import { RequestResetForm } from "./request-form";

export const metadata: Metadata = { title: "Choose a new password" };

export default function ResetPasswordPage() {
  return (
    <section className="rounded-lg border border-line bg-surface p-6">
      <h1 className="mb-1 text-xl font-semibold">Choose a new password</h1>
      <p className="mb-5 text-sm text-muted">We e-mail a link that works once, for an hour.</p>
      <RequestResetForm />
      <p className="mt-5 text-sm text-muted">
        <Link href="/sign-in" className="text-accent underline">
          Back to sign-in
        </Link>
      </p>
    </section>
  );
}
