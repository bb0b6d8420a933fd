import type { Metadata } from "next";
import { NotYet } from "@/components/not-yet";

export const metadata: Metadata = { title: "Cues" };

export default function Page() {
  return <NotYet feature="Cues" what="The cue list with tracking levels, and the stage manager's cue summary." />;
}
