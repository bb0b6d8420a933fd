import { userForPage } from "@/lib/auth/page-guards";
import { SignedInHeader } from "@/components/signed-in-header";

export default async function SignedInLayout({ children }: { children: React.ReactNode }) {
  const user = await userForPage();
  return (
    <div className="flex min-h-screen flex-col">
      <SignedInHeader userName={user.name} />
      <div className="flex-1">{children}</div>
    </div>
  );
}
