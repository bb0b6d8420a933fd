import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { getCurrentUser } from "@/lib/auth/session";
import { landingPathFor } from "@/lib/auth/landing";
import { SignInForm } from "./sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage() {
  const user = await getCurrentUser();
  if (user) redirect(await landingPathFor(user.id));
  return (
    <section className="rounded-lg border border-line bg-surface p-6">
      <h1 className="mb-1 text-xl font-semibold">Sign in</h1>
      <p className="mb-5 text-sm text-muted">Plot, focus charts and cues for your lighting department.</p>
      <SignInForm />
      <p className="mt-5 text-sm text-muted">
        New here?{" "}
        <Link href="/sign-up" className="text-accent underline">
          Create an account
        </Link>
        {" · "}
        <Link href="/reset-password" className="text-accent underline">
          Forgot your password?
        </Link>
      </p>
    </section>
  );
}
