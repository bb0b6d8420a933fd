import type { Metadata } from "next";
import { memberForPage } from "@/lib/auth/page-guards";
import { requireProduction } from "@/lib/data/productions";
import { can } from "@/lib/auth/policy";
import { SettingsForm } from "./settings-form";

export const metadata: Metadata = { title: "Settings" };

export default async function SettingsPage({ params }: { params: Promise<{ productionId: string }> }) {
  const { productionId, member } = await memberForPage((await params).productionId);
  const production = await requireProduction(productionId);
  return (
    <main className="mx-auto max-w-4xl px-4 py-6">
      <SettingsForm production={production} canEdit={can(member, "settings.edit")} />
    </main>
  );
}
