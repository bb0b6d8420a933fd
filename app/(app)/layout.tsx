import { userForPage } from "@/lib/auth/page-guards";
import { SignedInHeader } from "@/components/signed-in-header";

export default async function SignedInLayout({ children }: { children: React.ReactNode }) {
  const user = await userForPage();
  return (
    <div className="flex min-h-screen flex-col">
      {/* First in the tab order: past the header and the tabs, straight to the page's own content. */}
      <a href="#content" className="skip-link no-print">
        Skip to content
      </a>
      <SignedInHeader userName={user.name} />
      <div id="content" tabIndex={-1} className="flex-1 outline-none">
        {children}
      </div>
    </div>
  );
}
