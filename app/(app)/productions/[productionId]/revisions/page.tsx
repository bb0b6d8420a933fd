import type { Metadata } from "next";
import { NotYet } from "@/components/not-yet";

export const metadata: Metadata = { title: "Revisions" };

export default function Page() {
  return (
    <NotYet feature="Revisions" what="Issued revisions of the paperwork, change markers and e-mail to the team." />
  );
}
