"use client";

import { useEffect, useState } from "react";

/**
 * A table's sort and column choice, remembered in this browser (localStorage) under `key`. Read after
 * the first render, so the server's HTML and the first client render agree.
 */
export function useSavedTableView<T extends object>(key: string, initial: T): [T, (update: (v: T) => T) => void] {
  const [view, setView] = useState<T>(initial);
  const [ready, setReady] = useState(false);
  useEffect(() => {
    try {
      const saved = window.localStorage.getItem(key);
      if (saved) setView({ ...initial, ...(JSON.parse(saved) as Partial<T>) });
    } catch {
      // a damaged or blocked store: keep the defaults
    }
    setReady(true);
    // eslint-disable-next-line react-hooks/exhaustive-deps
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
