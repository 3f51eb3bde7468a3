import { handler } from "@/lib/api/handler";
import { authorizeAlternative } from "@/lib/authz-alternative";
import { decideAlternative } from "@/db/queries/alternatives";
import { requireMarkInputs } from "@/db/queries/search-inputs";
import { findUserById } from "@/db/queries/users";
import { decideAlternativeSchema } from "@/lib/validation/alternative";
import { designFromCandidateId } from "@/lib/candidate-design";
import { fingerprintMark } from "@/lib/search-request";
import { toAlternativeView } from "@/lib/alternative-view";
import { recordAudit } from "@/lib/audit";
import { notifyDecision } from "@/lib/notify";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** Engineers (and owners) approve or reject a proposal; approving sets the mark's design. */
export const POST = handler({ body: decideAlternativeSchema }, async ({ user, params, body }) => {
  const access = await authorizeAlternative(user, params.alternativeId ?? "", "approveAlternative");
  const inputs = await requireMarkInputs(access.markId);
  const design = designFromCandidateId(access.alternative.candidateId, inputs.project.cover);
  const decided = await decideAlternative({
    id: access.alternative.id,
    version: body.version,
    decision: body.decision,
    comment: body.comment,
    decidedBy: access.user.id,
    design,
  });
  await recordAudit({
    workspaceId: access.workspaceId,
    userId: access.user.id,
    action: `alternative.${body.decision}`,
    entity: "adopted_alternative",
    entityId: decided.id,
    before: { status: access.alternative.status, markDesign: inputs.mark.design },
    after: { status: decided.status, ...(body.decision === "approve" ? { markDesign: design } : {}), comment: body.comment },
  });
  const proposer = access.alternative.proposedBy ? await findUserById(access.alternative.proposedBy) : null;
  await notifyDecision({
    workspaceId: access.workspaceId,
    markLabel: inputs.mark.label,
    candidateId: decided.candidateId,
    decision: decided.status === "approved" ? "approved" : "rejected",
    decider: access.user.name || access.user.email,
    comment: body.comment,
    proposerEmail: proposer?.email ?? null,
  });
  return { alternative: toAlternativeView(decided, fingerprintMark(inputs)) };
});
