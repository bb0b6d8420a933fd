import Link from "next/link";
import { userForPage } from "@/lib/auth/page-guards";
import { ThemeToggle } from "@/components/theme-toggle";
import { Wordmark } from "@/components/wordmark";
import { signOutAction } from "../(auth)/actions";

export default async function SignedInLayout({ children }: { children: React.ReactNode }) {
  const user = await userForPage();
  return (
    <div className="flex min-h-screen flex-col">
      <header className="no-print flex items-center justify-between gap-4 border-b border-line bg-surface px-4 py-2">
        <Link href="/productions" aria-label="All productions">
          <Wordmark small />
        </Link>
        <div className="flex items-center gap-3 text-sm">
          <span className="text-muted" data-testid="signed-in-as">
            {user.name}
          </span>
          <ThemeToggle />
          <form action={signOutAction}>
            <button type="submit" className="rounded-md px-2 py-1.5 text-muted hover:text-ink">
              Sign out
            </button>
          </form>
        </div>
      </header>
      <div className="flex-1">{children}</div>
    </div>
  );
}
