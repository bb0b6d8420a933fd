import type { Metadata } from "next";
import { memberForPage } from "@/lib/auth/page-guards";
import { requireProduction } from "@/lib/data/productions";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { ProductionTabs } from "@/components/production-tabs";

/** Every page inside a production carries the production's name in its title ("Rig · Salt and Lantern · Throwline"). */
export async function generateMetadata({ params }: { params: Promise<{ productionId: string }> }): Promise<Metadata> {
  const { productionId } = await memberForPage((await params).productionId);
  const production = await requireProduction(productionId);
  return { title: { template: `%s · ${production.name} · Throwline`, default: `${production.name} · Throwline` } };
}

export default async function ProductionLayout({
  children,
  params,
}: {
  children: React.ReactNode;
  params: Promise<{ productionId: string }>;
}) {
  const { productionId, member } = await memberForPage((await params).productionId);
  const production = await requireProduction(productionId);
  // A page's <main> centres itself with auto margins, which in a flex column turns off stretching: without
  // w-full a wide child (a long unit strip) would widen the whole page past a tablet's screen.
  return (
    <div className="flex flex-col [&>main]:w-full">
      <section aria-label="Production" className="no-print border-b border-line bg-surface px-4 pt-3">
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <h1 className="text-lg font-semibold" data-testid="production-name">
            {production.name}
            <span className="ml-2 text-sm font-normal text-muted">{production.venue}</span>
          </h1>
          <span className="text-xs text-muted" data-testid="your-role">
            You: {ROLE_LABELS[member.role]}
            {member.isOwner ? " (owner)" : ""}
          </span>
        </div>
        <ProductionTabs productionId={productionId} />
      </section>
      {children}
    </div>
  );
}
