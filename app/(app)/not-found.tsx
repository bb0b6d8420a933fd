import { NotFoundMessage } from "@/components/not-found-message";

// Rendered inside the signed-in layout, which already shows the header.
export default function SignedInNotFound() {
  return <NotFoundMessage signedIn />;
}
