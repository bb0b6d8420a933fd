import type { Metadata } from "next";
import { Suspense } from "react";
import { CHART_CSS, PLAN_CSS } from "@/lib/focus/chart-css";
import { OutboxProvider } from "@/lib/offline/outbox-context";
import { FocusCall } from "../_components/focus-call";
import { loadFocusPage } from "../load-page";

export const metadata: Metadata = { title: "Focus call" };

export default async function FocusCallPage({ params }: { params: Promise<{ productionId: string }> }) {
  const data = await loadFocusPage((await params).productionId);
  return (
    <>
      {/* biome-ignore lint/security/noDangerouslySetInnerHtml: the charts' own constant stylesheet, no user text */}
      <style dangerouslySetInnerHTML={{ __html: CHART_CSS + PLAN_CSS }} />
      <Suspense>
        <OutboxProvider productionId={data.production.id}>
          <FocusCall data={data} />
        </OutboxProvider>
      </Suspense>
    </>
  );
}
