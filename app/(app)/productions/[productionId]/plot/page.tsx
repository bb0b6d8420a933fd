import type { Metadata } from "next";
import { NotYet } from "@/components/not-yet";

export const metadata: Metadata = { title: "Plot" };

export default function Page() {
  return <NotYet feature="Plot" what="The plan-view editor: hanging positions, fixtures, focus marks and live pools." />;
}
