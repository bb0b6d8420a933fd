"use client";

export function PrintButton() {
  return (
    <button
      type="button"
      onClick={() => window.print()}
      className="rounded border border-line px-3 py-1 text-sm hover:bg-raised print:hidden"
    >
      Print
    </button>
  );
}
