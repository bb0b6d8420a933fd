import type { Metadata } from "next";
import { NotYet } from "@/components/not-yet";

export const metadata: Metadata = { title: "Rig" };

export default function Page() {
  return <NotYet feature="Rig" what="Fixture tables for hanging, patching and programming, with CSV and Excel import and export." />;
}
