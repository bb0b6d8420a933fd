import type { Metadata } from "next";
import { NotYet } from "@/components/not-yet";

export const metadata: Metadata = { title: "Focus charts" };

export default function Page() {
  return <NotYet feature="Focus charts" what="One chart per fixture for the focus call, on a tablet on deck or printed." />;
}
