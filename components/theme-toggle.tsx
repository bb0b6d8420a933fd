"use client";

import { useEffect, useState } from "react";
import { THEME_STORAGE_KEY } from "./theme-script";

/** Switches between the light theme and the low-glare dark theme, and remembers the choice. */
export function ThemeToggle() {
  const [dark, setDark] = useState<boolean | null>(null);
  useEffect(() => setDark(document.documentElement.classList.contains("dark")), []);

  function toggle() {
    const next = !document.documentElement.classList.contains("dark");
    document.documentElement.classList.toggle("dark", next);
    localStorage.setItem(THEME_STORAGE_KEY, next ? "dark" : "light");
    setDark(next);
  }

  return (
    <button
      type="button"
      onClick={toggle}
      data-testid="theme-toggle"
      aria-pressed={dark ?? undefined}
      className="rounded-md border border-line px-3 py-1.5 text-sm text-muted hover:text-ink"
    >
      {dark ? "Light room" : "Dark room"}
    </button>
  );
}
