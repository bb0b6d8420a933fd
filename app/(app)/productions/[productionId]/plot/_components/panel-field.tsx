"use client";

import { useEffect, useId, useState } from "react";

/**
 * A side-panel field that commits on Enter or blur. `commit` answers an error message (shown at the
 * field, announced) or null. Read-only members see plain text, with no input at all.
 */
export function PanelField({
  label,
  value,
  placeholder,
  hint,
  editable,
  commit,
  testId,
  error: outsideError,
}: {
  label: string;
  value: string;
  placeholder?: string;
  hint?: string;
  editable: boolean;
  commit: (text: string) => Promise<string | null> | string | null;
  testId?: string;
  error?: string | null;
}) {
  const id = useId();
  const [text, setText] = useState(value);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    setText(value);
    setError(null);
  }, [value]);
  const shown = error ?? outsideError ?? null;

  if (!editable) {
    return (
      <div className="flex items-baseline justify-between gap-2 text-sm">
        <span className="text-muted">{label}</span>
        <span data-testid={testId} className="text-right">
          {value || placeholder || "—"}
        </span>
      </div>
    );
  }
  async function save() {
    if (text === value) return;
    setError(await commit(text.trim()));
  }
  return (
    <label className="flex flex-col gap-0.5 text-sm" htmlFor={id}>
      <span className="text-muted">{label}</span>
      <input
        id={id}
        data-testid={testId}
        value={text}
        placeholder={placeholder}
        aria-invalid={shown ? true : undefined}
        aria-describedby={`${id}-msg`}
        onChange={(e) => setText(e.target.value)}
        onBlur={save}
        onKeyDown={(e) => {
          if (e.key === "Enter") void save();
          if (e.key === "Escape") setText(value);
        }}
        className="min-h-9 rounded-md border border-line bg-surface px-2 text-ink aria-invalid:border-danger"
      />
      <span id={`${id}-msg`} aria-live="polite" className={shown ? "text-xs text-danger" : "text-xs text-muted"}>
        {shown ?? hint ?? ""}
      </span>
    </label>
  );
}

export function PanelSection({
  title,
  children,
  testId,
}: {
  title: string;
  children: React.ReactNode;
  testId?: string;
}) {
  return (
    <section className="border-b border-line px-3 py-3" data-testid={testId}>
      <h3 className="mb-2 text-xs font-semibold uppercase tracking-wide text-muted">{title}</h3>
      <div className="flex flex-col gap-2">{children}</div>
    </section>
  );
}
