"use client";

import { useEffect, useState } from "react";

/**
 * A table's sort and column choice, remembered in this browser (localStorage) under `key`. Read after
 * the first render, so the server's HTML and the first client render agree.
 */
export function useSavedTableView<T extends object>(key: string, initial: T): [T, (update: (v: T) => T) => void] {
  const [view, setView] = useState<T>(initial);
  const [ready, setReady] = useState(false);
  // biome-ignore lint/correctness/useExhaustiveDependencies: read once per key; `initial` is a fresh object each render
  useEffect(() => {
    try {
      const saved = window.localStorage.getItem(key);
      if (saved) setView({ ...initial, ...(JSON.parse(saved) as Partial<T>) });
    } catch {
      // a damaged or blocked store: keep the defaults
    }
    setReady(true);
  }, [key]);
  useEffect(() => {
    if (!ready) return;
    try {
      window.localStorage.setItem(key, JSON.stringify(view));
    } catch {
      // private mode or a full store: the view just is not remembered
    }
  }, [key, view, ready]);
  return [view, (update) => setView(update)];
}
