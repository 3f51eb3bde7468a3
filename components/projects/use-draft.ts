"use client";
/**
 * An unsaved form draft kept in localStorage under the record's id and version, so a reload
 * does not lose typing; a draft made against an older version is dropped (the server has moved on).
 * Forms using it render only after their record has loaded in the browser, and are keyed by the
 * record's version, so the draft is read once, when the form mounts.
 */
import { useCallback, useState } from "react";

function readDraft<T>(storageKey: string, version: number): T | null {
  if (typeof window === "undefined") return null;
  try {
    const raw = window.localStorage.getItem(storageKey);
    if (!raw) return null;
    const saved = JSON.parse(raw) as { version: number; value: T };
    if (saved.version === version) return saved.value;
    window.localStorage.removeItem(storageKey);
  } catch {
    // unreadable draft: start from the record
  }
  return null;
}

export function useDraft<T>(key: string, base: T, version: number): [T, (next: T) => void, () => void, boolean] {
  const storageKey = `caryatid:draft:${key}`;
  const [initial] = useState(() => readDraft<T>(storageKey, version));
  const [value, setValue] = useState<T>(initial ?? base);
  const [restored, setRestored] = useState(initial !== null);
  const update = useCallback(
    (next: T) => {
      setValue(next);
      try {
        window.localStorage.setItem(storageKey, JSON.stringify({ version, value: next }));
      } catch {
        // storage full or blocked: the draft simply is not kept
      }
    },
    [storageKey, version],
  );
  const clear = useCallback(() => {
    setRestored(false);
    try {
      window.localStorage.removeItem(storageKey);
    } catch {
      // nothing kept
    }
  }, [storageKey]);
  return [value, update, clear, restored];
}
