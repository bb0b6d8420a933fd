import { getCurrentUser } from "@/lib/auth/session";
import { SignedInHeader } from "@/components/signed-in-header";
import { NotFoundMessage } from "@/components/not-found-message";

// For an address no route matches, this renders outside the signed-in layout, so it brings the header
// back itself: a person who followed a stale link still sees who they are and can go home or sign out.
// (A not-found inside the signed-in area uses app/(app)/not-found.tsx, within that layout's header.)
export default async function NotFound() {
  const user = await getCurrentUser().catch(() => null);
  return (
    <div className="flex min-h-screen flex-col">
      {user ? <SignedInHeader userName={user.name} /> : null}
      <NotFoundMessage signedIn={!!user} />
    </div>
  );
}
