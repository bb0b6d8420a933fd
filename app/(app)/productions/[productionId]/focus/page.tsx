import type { Metadata } from "next";
import { Suspense } from "react";
import { CHART_CSS } from "@/lib/focus/chart-css";
import { FocusList } from "./_components/focus-list";
import { loadFocusPage } from "./load-page";

export const metadata: Metadata = { title: "Focus charts" };

export default async function FocusPage({ params }: { params: Promise<{ productionId: string }> }) {
  const data = await loadFocusPage((await params).productionId);
  return (
    <>
      {/* biome-ignore lint/security/noDangerouslySetInnerHtml: the charts' own constant stylesheet, no user text */}
      <style dangerouslySetInnerHTML={{ __html: CHART_CSS }} />
      <Suspense>
        <FocusList data={data} />
      </Suspense>
    </>
  );
}
