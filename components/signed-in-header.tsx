import Link from "next/link";
import { ThemeToggle } from "@/components/theme-toggle";
import { Wordmark } from "@/components/wordmark";
import { signOutAction } from "@/app/(auth)/actions";

/** The bar above every signed-in page, the not-found page included: home, who is signed in, theme, Sign out. */
export function SignedInHeader({ userName }: { userName: string }) {
  return (
    <header className="no-print flex items-center justify-between gap-4 border-b border-line bg-surface px-4 py-2">
      <Link href="/productions" aria-label="Throwline, all productions">
        <Wordmark small />
      </Link>
      <div className="flex items-center gap-3 text-sm">
        <span className="text-muted" data-testid="signed-in-as">
          {userName}
        </span>
        <ThemeToggle />
        <form action={signOutAction}>
          <button type="submit" className="rounded-md px-2 py-1.5 text-muted hover:text-ink">
            Sign out
          </button>
        </form>
      </div>
    </header>
  );
}
