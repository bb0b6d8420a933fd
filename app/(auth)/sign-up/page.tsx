import type { Metadata } from "next";
import Link from "next/link";
import { SignUpForm } from "./sign-up-form";

export const metadata: Metadata = { title: "Create an account" };

export default function SignUpPage() {
  return (
    <section className="rounded-lg border border-line bg-surface p-6">
      <h1 className="mb-1 text-xl font-semibold">Create an account</h1>
      <p className="mb-5 text-sm text-muted">
        Tell us your name and e-mail address. We send a link there; from it you choose a password, then start a
        production of your own or join the ones that have invited you.
      </p>
      <SignUpForm />
      <p className="mt-5 text-sm text-muted">
        Already have an account?{" "}
        <Link href="/sign-in" className="text-accent underline">
          Sign in
        </Link>
      </p>
    </section>
  );
}
