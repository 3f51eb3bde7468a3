"use client";
/**
 * The proposals and adopted alternatives of one mark, newest first: status, "stale" when the
 * mark's loads, lengths or price book changed since the alternative was checked, a one-click
 * re-check, and approve / reject with a comment for engineers and owners. The server enforces
 * every role; this panel only hides what the signed-in role cannot do.
 */
import { useId, useState } from "react";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { callApi, issuesByPath } from "@/components/projects/api";
import { formatNumber, type UnitSystem } from "@/components/projects/units";
import type { CheckOutput } from "@/engine/types";
import { describeCandidate, formatDollars } from "@/components/search/candidate-format";
import { roleCan, type AlternativeStatus, type AlternativeView, type CandidateRow } from "@/components/search/search-types";
import { parseCandidateId } from "@/optimizer/candidate-id";

export interface AlternativesPanelProps {
  workspaceId: string;
  projectId: string;
  markId: string;
  role: string;
  units: UnitSystem;
}

interface MemberLite {
  userId: string;
  name: string;
  email: string;
}

export const alternativesKey = (markId: string) => ["alternatives", markId] as const;

const STATUS_LABEL: Record<AlternativeStatus, string> = {
  proposed: "awaiting an engineer",
  approved: "adopted",
  rejected: "turned down",
  superseded: "replaced by a later adoption",
};

const STATUS_STYLE: Record<AlternativeStatus, string> = {
  proposed: "bg-stone-100 text-ink-700",
  approved: "bg-sound-600 text-white",
  rejected: "bg-strained-600 text-white",
  superseded: "bg-stone-100 text-ink-500",
};

/** The candidate as stored with the proposal, filled from its id where the stored copy is thin. */
function candidateOf(alt: AlternativeView): CandidateRow {
  const stored = (alt.candidate ?? {}) as Partial<CandidateRow>;
  const parts = parseCandidateId(alt.candidateId);
  const fromId: Partial<CandidateRow> = parts
    ? parts.shape === "rect"
      ? { shape: "rect", b: parts.b, h: parts.h, fc: parts.fc, fy: parts.fy, confinement: "tied", braceLevels: parts.braceLevels, bars: { size: parts.size, count: 2 * parts.nb + 2 * (parts.nh - 2), layout: { type: "perimeter", nb: parts.nb, nh: parts.nh } } }
      : { shape: "circle", D: parts.D, fc: parts.fc, fy: parts.fy, confinement: parts.confinement, braceLevels: parts.braceLevels, bars: { size: parts.size, count: parts.n, layout: { type: "circle", n: parts.n } } }
    : {};
  return { id: alt.candidateId, shape: "rect", cost: Number.NaN, carbon: Number.NaN, utilization: Number.NaN, onFront: false, ...fromId, ...stored } as CandidateRow;
}

export function AlternativesPanel({ workspaceId, projectId, markId, role, units }: AlternativesPanelProps) {
  const alternatives = useQuery({
    queryKey: alternativesKey(markId),
    queryFn: () => callApi<{ alternatives: AlternativeView[] }>(`/api/marks/${markId}/alternatives`),
  });
  const members = useQuery({
    queryKey: ["members", workspaceId],
    queryFn: () => callApi<{ members: MemberLite[] }>(`/api/workspaces/${workspaceId}/members`),
    staleTime: 60_000,
  });
  const nameOf = (userId: string | null) => {
    if (!userId) return "someone no longer in the workspace";
    const m = members.data?.members.find((x) => x.userId === userId);
    return m ? m.name || m.email : "a workspace member";
  };
  const list = alternatives.data?.alternatives ?? [];
  return (
    <section aria-labelledby="alternatives-heading" className="space-y-3">
      <h2 id="alternatives-heading" className="text-lg font-semibold">
        Proposals and adopted alternatives
      </h2>
      {alternatives.isError ? <p role="alert">The proposals could not be loaded: {alternatives.error.message}</p> : null}
      {alternatives.isSuccess && list.length === 0 ? (
        <p className="text-sm text-ink-700">Nothing proposed yet. Open a finished search, pick a candidate and propose it for this mark.</p>
      ) : null}
      <ul className="space-y-3">
        {list.map((alt) => (
          <AlternativeItem key={alt.id} alt={alt} role={role} units={units} markId={markId} projectId={projectId} nameOf={nameOf} />
        ))}
      </ul>
    </section>
  );
}

function AlternativeItem({
  alt,
  role,
  units,
  markId,
  projectId,
  nameOf,
}: {
  alt: AlternativeView;
  role: string;
  units: UnitSystem;
  markId: string;
  projectId: string;
  nameOf: (id: string | null) => string;
}) {
  const queryClient = useQueryClient();
  const commentId = useId();
  const [comment, setComment] = useState("");
  const candidate = candidateOf(alt);
  const refresh = () => {
    void queryClient.invalidateQueries({ queryKey: alternativesKey(markId) });
    void queryClient.invalidateQueries({ queryKey: ["mark", markId] });
    void queryClient.invalidateQueries({ queryKey: ["check-input", markId] });
    void queryClient.invalidateQueries({ queryKey: ["marks", projectId] });
    void queryClient.invalidateQueries({ queryKey: ["schedule", projectId] });
  };
  const decide = useMutation({
    mutationFn: (decision: "approve" | "reject") =>
      callApi<{ alternative: AlternativeView }>(`/api/alternatives/${alt.id}/decision`, { method: "POST", body: { decision, version: alt.version, comment } }),
    onSuccess: () => {
      setComment("");
      refresh();
    },
  });
  const recheck = useMutation({
    mutationFn: () => callApi<{ pass: boolean; check: CheckOutput; alternative: AlternativeView }>(`/api/alternatives/${alt.id}/recheck`, { method: "POST" }),
    onSuccess: refresh,
  });
  const canDecide = alt.status === "proposed" && roleCan(role, "approveAlternative");
  const canRecheck = (alt.status === "proposed" || alt.status === "approved") && roleCan(role, "runSearch");
  const decideIssues = issuesByPath(decide.error);
  return (
    <li className="panel space-y-2" data-testid="alternative-item" aria-label={`Alternative ${alt.candidateId}`}>
      <div className="flex flex-wrap items-center gap-2">
        <span className="font-mono text-sm">{alt.candidateId}</span>
        <span className={`rounded px-2 py-0.5 text-xs font-semibold ${STATUS_STYLE[alt.status]}`} data-testid="alternative-status">
          {STATUS_LABEL[alt.status]}
        </span>
        {alt.stale && alt.status !== "superseded" && alt.status !== "rejected" ? (
          <span className="rounded border border-strained-600 px-2 py-0.5 text-xs font-semibold text-strained-600" data-testid="alternative-stale" title="the mark's loads, lengths or the price book changed since it was checked">
            stale — re-check it
          </span>
        ) : null}
      </div>
      <p className="text-sm">{describeCandidate(candidate, units)}</p>
      <p className="text-sm tabular-nums text-ink-700">
        {formatDollars(candidate.cost, 2)} per column · utilization {formatNumber(candidate.utilization, 3)}
        {candidate.governing ? ` (governed by ${candidate.governing})` : ""}
      </p>
      <p className="text-xs text-ink-500">
        Proposed by {nameOf(alt.proposedBy)} on {new Date(alt.createdAt).toLocaleString("en-US", { dateStyle: "medium", timeStyle: "short" })}
        {alt.decidedAt ? ` · ${alt.status === "rejected" ? "turned down" : "decided"} by ${nameOf(alt.decidedBy)} on ${new Date(alt.decidedAt).toLocaleString("en-US", { dateStyle: "medium", timeStyle: "short" })}` : ""}
      </p>
      {alt.comment ? <p className="border-l-2 border-stone-200 pl-2 text-sm italic text-ink-700">“{alt.comment}”</p> : null}
      {canDecide ? (
        <div className="space-y-2 border-t border-stone-100 pt-2">
          <label htmlFor={commentId} className="field-label">
            Comment <span className="font-normal text-ink-500">(required to turn it down)</span>
          </label>
          <textarea id={commentId} className="field-input" rows={2} value={comment} onChange={(e) => setComment(e.target.value)} maxLength={2000} />
          {decideIssues.comment ? <p className="field-error">{decideIssues.comment}</p> : null}
          <div className="flex gap-2">
            <button type="button" className="btn-primary" disabled={decide.isPending} onClick={() => decide.mutate("approve")}>
              Approve and adopt
            </button>
            <button type="button" className="btn-quiet" disabled={decide.isPending} onClick={() => decide.mutate("reject")}>
              Turn down
            </button>
          </div>
          {decide.isError && !decideIssues.comment ? (
            <p role="alert" className="text-sm text-strained-600">
              {decide.error.message}
            </p>
          ) : null}
        </div>
      ) : null}
      {canRecheck ? (
        <div className="flex flex-wrap items-center gap-3">
          <button type="button" className="btn-quiet" disabled={recheck.isPending} onClick={() => recheck.mutate()}>
            {recheck.isPending ? "Re-checking…" : "Re-check with current inputs"}
          </button>
          {recheck.data ? (
            <span role="status" className={`text-sm ${recheck.data.pass ? "text-sound-600" : "text-strained-600"}`}>
              {recheck.data.pass
                ? `✓ still passes: utilization ${formatNumber(recheck.data.check.utilization, 3)}; its figures are current again.`
                : `✗ no longer passes: utilization ${recheck.data.check.utilization === null ? "unbounded" : formatNumber(recheck.data.check.utilization, 3)}${recheck.data.check.reasons[0] ? ` — ${recheck.data.check.reasons[0]}` : ""}. Run a new search.`}
            </span>
          ) : null}
          {recheck.isError ? (
            <span role="alert" className="text-sm text-strained-600">
              {recheck.error.message}
            </span>
          ) : null}
        </div>
      ) : null}
    </li>
  );
}
