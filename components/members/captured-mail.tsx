"use client";
import { useState } from "react";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/components/providers";
import { FormAlert } from "@/components/auth/form-parts";

interface OutboxMessage {
  id: string;
  to: string;
  subject: string;
  text: string;
  status: "pending" | "sent" | "failed";
  attempts: number;
  lastError: string | null;
  createdAt: string;
  sentAt: string | null;
}

export interface CapturedMailProps {
  workspaceId: string;
}

const timeFormat = new Intl.DateTimeFormat("en", { month: "short", day: "numeric", hour: "2-digit", minute: "2-digit", second: "2-digit" });
const STATUS_LABEL = { pending: "waiting", sent: "delivered to the catcher", failed: "not delivered" } as const;

/** The workspace's outgoing mail (development only), with a retry for what did not go out. */
export function CapturedMail({ workspaceId }: CapturedMailProps) {
  const queryClient = useQueryClient();
  const key = ["workspaces", workspaceId, "mail"];
  const [open, setOpen] = useState<string | null>(null);
  const mail = useQuery({
    queryKey: key,
    queryFn: () => fetchJson<{ messages: OutboxMessage[] }>(`/api/workspaces/${workspaceId}/mail`).then((r) => r.messages),
    refetchInterval: 5000,
  });
  const retry = useMutation({
    mutationFn: () => fetchJson<{ sent: number }>(`/api/workspaces/${workspaceId}/mail/retry`, { method: "POST" }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: key }),
  });
  const waiting = mail.data?.filter((m) => m.status !== "sent").length ?? 0;

  if (mail.isPending) return <p className="text-sm text-ink-500">Loading mail…</p>;
  if (mail.isError) return <FormAlert>{mail.error.message}</FormAlert>;
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center gap-3">
        <p className="text-sm text-ink-500">
          {mail.data.length} message{mail.data.length === 1 ? "" : "s"}
          {waiting ? `, ${waiting} not delivered yet` : ""}.
        </p>
        <button type="button" className="btn-quiet ml-auto" onClick={() => retry.mutate()} disabled={retry.isPending || waiting === 0}>
          {retry.isPending ? "Sending…" : "Send waiting mail again"}
        </button>
      </div>
      {retry.data ? <FormAlert tone="success">{retry.data.sent} message(s) delivered.</FormAlert> : null}
      {retry.error ? <FormAlert>{retry.error.message}</FormAlert> : null}
      {mail.data.length === 0 ? (
        <div className="panel text-sm text-ink-500">No mail yet. Invitations you send appear here.</div>
      ) : (
        <ul className="space-y-2">
          {mail.data.map((m) => (
            <li key={m.id} className="panel p-0">
              <button
                type="button"
                className="flex w-full flex-wrap items-center gap-x-4 gap-y-1 px-4 py-3 text-left"
                aria-expanded={open === m.id}
                aria-controls={`mail-${m.id}`}
                onClick={() => setOpen(open === m.id ? null : m.id)}
              >
                <span className="font-medium text-ink-900">{m.subject}</span>
                <span className="text-sm text-ink-500">to {m.to}</span>
                <span className={`ml-auto text-xs ${m.status === "sent" ? "text-sound-600" : "text-strained-600"}`}>
                  {STATUS_LABEL[m.status]} · {m.attempts} attempt{m.attempts === 1 ? "" : "s"} · {timeFormat.format(new Date(m.createdAt))}
                </span>
              </button>
              {open === m.id ? (
                <div id={`mail-${m.id}`} className="border-t border-stone-100 px-4 py-3">
                  {m.lastError && m.status !== "sent" ? <p className="mb-2 text-xs text-strained-600">Last error: {m.lastError}</p> : null}
                  <pre className="whitespace-pre-wrap break-words font-mono text-xs text-ink-700">{m.text}</pre>
                </div>
              ) : null}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
