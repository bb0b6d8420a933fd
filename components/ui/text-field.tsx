import type { InputHTMLAttributes } from "react";

/** A labelled input whose error is announced and tied to it (aria-describedby). */
export function TextField({
  label,
  name,
  error,
  hint,
  className = "",
  ...props
}: InputHTMLAttributes<HTMLInputElement> & { label: string; name: string; error?: string[] | string; hint?: string }) {
  const errors = Array.isArray(error) ? error : error ? [error] : [];
  const describedBy = errors.length ? `${name}-error` : hint ? `${name}-hint` : undefined;
  return (
    <label className={`flex flex-col gap-1 text-sm ${className}`}>
      <span className="font-medium">{label}</span>
      <input
        name={name}
        aria-invalid={errors.length > 0 || undefined}
        aria-describedby={describedBy}
        className="min-h-10 rounded-md border border-line bg-surface px-3 text-ink aria-invalid:border-danger pointer-coarse:min-h-11"
        {...props}
      />
      {hint && !errors.length ? (
        <span id={`${name}-hint`} className="text-xs text-muted">
          {hint}
        </span>
      ) : null}
      <span id={`${name}-error`} aria-live="polite" className="text-xs text-danger">
        {errors.join(" ")}
      </span>
    </label>
  );
}
