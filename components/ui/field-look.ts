// How a value looks when the reader's role may change it, and when it may not, in one place so every
// screen says it the same way in both themes. An editable field shows its outline (the --field token,
// 3:1 against every background, WCAG 2.2 1.4.11) and a focus ring; a read-only value is plain text with
// no outline, no hover and no pointer, so nobody types into something the server would refuse.
// Which fields a role may change is never decided here: lib/auth/policy.ts answers, the page passes it down.

/** An input (or a button that opens one) the reader may change. */
export const EDITABLE_FIELD =
  "rounded border border-field bg-canvas px-1.5 text-ink hover:border-accent focus-visible:border-accent focus-visible:outline-2 focus-visible:outline-offset-1 focus-visible:outline-accent";

/** A value the reader may see but not change. */
export const READ_ONLY_VALUE = "cursor-default px-1.5 text-ink";
