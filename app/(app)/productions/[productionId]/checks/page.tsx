import type { Metadata } from "next";
import { NotYet } from "@/components/not-yet";

export const metadata: Metadata = { title: "Checks" };

export default function Page() {
  return <NotYet feature="Checks" what="Power, DMX and rigging-load checks." />;
}
