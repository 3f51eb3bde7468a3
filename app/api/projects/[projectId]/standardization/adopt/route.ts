import { NextResponse } from "next/server";
import { handler } from "@/lib/api/handler";
import { unprocessable } from "@/lib/api/errors";
import { authorizeProject } from "@/lib/authz";
import { roleAllows } from "@/lib/permissions";
import { latestPriceBook } from "@/db/queries/price-books";
import { decideAlternative, insertProposal } from "@/db/queries/alternatives";
import { findSearch } from "@/db/queries/searches";
import { readMarkInputs } from "@/db/queries/search-inputs";
import { adoptStandardizationSchema } from "@/lib/validation/standardization";
import { gatherStandardization, solveProject } from "@/lib/standardize/project-standardization";
import { designFromCandidateId } from "@/lib/candidate-design";
import { recordAudit } from "@/lib/audit";
import { notifyDecision, notifyProposal } from "@/lib/notify";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/**
 * Adopts the whole assignment for N outlines, mark by mark, as for single marks: an estimator's
 * call proposes each mark's candidate; an engineer's (or owner's) call proposes and approves, so
 * every mark then carries its standardized design.
 */
export const POST = handler({ body: adoptStandardizationSchema }, async ({ user, params, body }) => {
  const access = await authorizeProject(user, params.projectId ?? "", "proposeAlternative");
  const approve = roleAllows(access.role, "approveAlternative");
  const book = await latestPriceBook(access.projectId);
  const gathered = await gatherStandardization(access.projectId, body, book?.formSet ?? 0);
  if (gathered.missing.length > 0) {
    throw unprocessable("some marks have no finished search", gathered.missing.map((m) => ({ path: `marks.${m.label}`, message: `column mark ${m.label} has no finished search: run one first` })));
  }
  const result = solveProject(gathered, body.maxOutlines);
  if (!result.feasible) throw unprocessable(result.reasons.join("; ") || "no assignment exists", result.reasons.map((r) => ({ path: "maxOutlines", message: r })));

  const adopted: Array<{ markId: string; label: string; candidateId: string; alternativeId: string; status: string }> = [];
  for (const entry of result.assignment) {
    const search = await findSearch(entry.candidate.searchId);
    const inputs = await readMarkInputs(entry.markId);
    if (!search || !inputs) continue;
    const comment = body.comment || `Standardized to ${result.outlines.length} outline(s): ${entry.outline}`;
    let row = await insertProposal({
      markId: entry.markId,
      searchId: search.id,
      candidateId: entry.candidateId,
      candidate: entry.candidate,
      inputsHash: search.inputsHash,
      priceBookId: search.priceBookId,
      proposedBy: access.user.id,
      comment,
    });
    if (approve) {
      row = await decideAlternative({
        id: row.id,
        version: row.version,
        decision: "approve",
        comment,
        decidedBy: access.user.id,
        design: designFromCandidateId(entry.candidateId, inputs.project.cover),
      });
    }
    adopted.push({ markId: entry.markId, label: entry.label, candidateId: entry.candidateId, alternativeId: row.id, status: row.status });
  }
  await recordAudit({
    workspaceId: access.workspaceId,
    userId: access.user.id,
    action: approve ? "standardization.approve" : "standardization.propose",
    entity: "project",
    entityId: access.projectId,
    after: { maxOutlines: body.maxOutlines, totalCost: result.totalCost, outlines: result.outlines.map((o) => o.key), adopted },
  });
  // One message for the whole set rather than one per mark.
  const summary = {
    workspaceId: access.workspaceId,
    markLabel: adopted.map((a) => a.label).join(", "),
    candidateId: `a standardized set of ${result.outlines.length} outline(s)`,
    comment: body.comment,
  };
  if (approve) {
    await notifyDecision({ ...summary, decision: "approved", decider: access.user.name || access.user.email, proposerEmail: null });
  } else {
    await notifyProposal({ ...summary, proposer: access.user.name || access.user.email });
  }
  return NextResponse.json({ result, adopted }, { status: 201 });
});
