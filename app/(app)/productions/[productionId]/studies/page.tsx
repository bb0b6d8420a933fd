import type { Metadata } from "next";
import { NotYet } from "@/components/not-yet";

export const metadata: Metadata = { title: "Studies" };

export default function Page() {
  return <NotYet feature="Studies" what="Coverage and shadow studies over the acting areas." />;
}
