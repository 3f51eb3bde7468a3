import { NextResponse } from "next/server";
import { handler } from "@/lib/api/handler";
import { notFound, unprocessable } from "@/lib/api/errors";
import { authorizeMark } from "@/lib/authz";
import { requireMarkInputs } from "@/db/queries/search-inputs";
import { findCandidate, findSearch } from "@/db/queries/searches";
import { insertProposal, listAlternativesOfMark } from "@/db/queries/alternatives";
import { fingerprintMark } from "@/lib/search-request";
import { proposeAlternativeSchema } from "@/lib/validation/alternative";
import { toAlternativeView } from "@/lib/alternative-view";
import { recordAudit } from "@/lib/audit";
import { notifyProposal } from "@/lib/notify";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export const GET = handler({}, async ({ user, params }) => {
  const access = await authorizeMark(user, params.markId ?? "", "read");
  const inputs = await requireMarkInputs(access.markId);
  const current = fingerprintMark(inputs);
  const rows = await listAlternativesOfMark(access.markId);
  return { alternatives: rows.map((row) => toAlternativeView(row, current)) };
});

/** Proposes a candidate of one of this mark's finished searches. */
export const POST = handler({ body: proposeAlternativeSchema }, async ({ user, params, body }) => {
  const access = await authorizeMark(user, params.markId ?? "", "proposeAlternative");
  const search = await findSearch(body.searchId);
  if (!search || search.markId !== access.markId) throw notFound("search not found");
  const candidate = await findCandidate(search.id, body.candidateId);
  if (!candidate) throw unprocessable("no such passing candidate in that search", [{ path: "candidateId", message: `${body.candidateId} is not among the search's results` }]);
  const inputs = await requireMarkInputs(access.markId);
  const row = await insertProposal({
    markId: access.markId,
    searchId: search.id,
    candidateId: body.candidateId,
    candidate: candidate.data,
    // The proposal carries the inputs its search ran with: if those already moved on, it is stale at once.
    inputsHash: search.inputsHash,
    priceBookId: search.priceBookId,
    proposedBy: access.user.id,
    comment: body.comment,
  });
  await recordAudit({
    workspaceId: access.workspaceId,
    userId: access.user.id,
    action: "alternative.propose",
    entity: "adopted_alternative",
    entityId: row.id,
    after: { markId: access.markId, candidateId: body.candidateId, comment: body.comment },
  });
  await notifyProposal({
    workspaceId: access.workspaceId,
    markLabel: inputs.mark.label,
    candidateId: body.candidateId,
    proposer: access.user.name || access.user.email,
    comment: body.comment,
  });
  return NextResponse.json({ alternative: toAlternativeView(row, fingerprintMark(inputs)) }, { status: 201 });
});
