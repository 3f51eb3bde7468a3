"use client";
/**
 * Shown when a save is refused because someone else changed the record first (409): lists each
 * field whose stored value now differs from what this person started from, and offers to load
 * the current record (their unsaved edits stay visible until they do).
 */
export interface ConflictNoticeProps {
  /** what this person started editing from */
  mine: Record<string, unknown>;
  /** the record as it is now on the server */
  current: Record<string, unknown>;
  /** field names worth comparing, with labels */
  fields: Array<{ key: string; label: string; format?: (v: unknown) => string }>;
  onReload: () => void;
}

function show(v: unknown): string {
  if (v === undefined || v === null || v === "") return "(empty)";
  if (typeof v === "object") return JSON.stringify(v);
  return String(v);
}

export function ConflictNotice({ mine, current, fields, onReload }: ConflictNoticeProps) {
  const changed = fields.filter((f) => JSON.stringify(mine[f.key]) !== JSON.stringify(current[f.key]));
  return (
    <div role="alert" className="rounded-md border border-strained-600 bg-stone-50 p-4 text-sm">
      <p className="font-semibold text-strained-600">Not saved: someone else changed this first (now version {show(current.version)}).</p>
      {changed.length > 0 ? (
        <ul className="mt-2 space-y-1" aria-label="What changed">
          {changed.map((f) => (
            <li key={f.key}>
              <span className="font-medium">{f.label}</span>: {(f.format ?? show)(mine[f.key])} → <strong>{(f.format ?? show)(current[f.key])}</strong>
            </li>
          ))}
        </ul>
      ) : (
        <p className="mt-2">The fields you see are unchanged; other details were edited.</p>
      )}
      <button type="button" className="btn-quiet mt-3" onClick={onReload}>
        Load the current version
      </button>
    </div>
  );
}
