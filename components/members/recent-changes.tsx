"use client";
import { useQuery } from "@tanstack/react-query";
import { fetchJson } from "@/components/providers";
import { FormAlert } from "@/components/auth/form-parts";

interface AuditEntry {
  id: string;
  action: string;
  entity: string;
  before: unknown;
  after: unknown;
  at: string;
  userName: string | null;
  userEmail: string | null;
}

export interface RecentChangesProps {
  workspaceId: string;
  /** how many entries to show */
  limit?: number;
}

const timeFormat = new Intl.DateTimeFormat("en", { month: "short", day: "numeric", hour: "2-digit", minute: "2-digit" });

function summarise(value: unknown): string {
  if (value === null || value === undefined) return "—";
  if (typeof value !== "object") return String(value);
  return Object.entries(value as Record<string, unknown>)
    .filter(([k]) => k !== "userId")
    .map(([k, v]) => `${k}: ${typeof v === "object" ? JSON.stringify(v) : String(v)}`)
    .join(", ");
}

/** The workspace's audit log for its owners: who changed what, when, before and after. */
export function RecentChanges({ workspaceId, limit = 25 }: RecentChangesProps) {
  const audit = useQuery({
    queryKey: ["workspaces", workspaceId, "audit"],
    queryFn: () => fetchJson<{ entries: AuditEntry[] }>(`/api/workspaces/${workspaceId}/audit`).then((r) => r.entries.slice(0, limit)),
  });
  return (
    <section aria-labelledby="changes-heading" className="panel space-y-3">
      <h2 id="changes-heading" className="text-base font-semibold">
        Recent changes
      </h2>
      {audit.isPending ? (
        <p className="text-sm text-ink-500">Loading…</p>
      ) : audit.isError ? (
        <FormAlert>{audit.error.message}</FormAlert>
      ) : audit.data.length === 0 ? (
        <p className="text-sm text-ink-500">Nothing has changed yet.</p>
      ) : (
        <div className="overflow-x-auto">
          <table className="min-w-full text-sm">
            <thead className="text-left text-xs uppercase tracking-wide text-ink-500">
              <tr>
                <th scope="col" className="py-1 pr-4 font-medium">When</th>
                <th scope="col" className="py-1 pr-4 font-medium">Who</th>
                <th scope="col" className="py-1 pr-4 font-medium">What</th>
                <th scope="col" className="py-1 pr-4 font-medium">Before</th>
                <th scope="col" className="py-1 font-medium">After</th>
              </tr>
            </thead>
            <tbody className="divide-y divide-stone-100 align-top">
              {audit.data.map((e) => (
                <tr key={e.id}>
                  <td className="whitespace-nowrap py-1.5 pr-4 text-ink-500">{timeFormat.format(new Date(e.at))}</td>
                  <td className="py-1.5 pr-4">{e.userName || e.userEmail || "someone since removed"}</td>
                  <td className="whitespace-nowrap py-1.5 pr-4">
                    {e.action} {e.entity}
                  </td>
                  <td className="py-1.5 pr-4 text-ink-500">{summarise(e.before)}</td>
                  <td className="py-1.5 text-ink-700">{summarise(e.after)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
