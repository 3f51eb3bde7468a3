import { handler } from "@/lib/api/handler";
import { authorizeAlternative } from "@/lib/authz-alternative";
import { refreshAlternative } from "@/db/queries/alternatives";
import { requireMarkInputs } from "@/db/queries/search-inputs";
import { designFromCandidateId } from "@/lib/candidate-design";
import { buildMarkCheckInput } from "@/lib/mark-check-input";
import { fingerprintMark } from "@/lib/search-request";
import { toAlternativeView } from "@/lib/alternative-view";
import { recordAudit } from "@/lib/audit";
import { checkMember } from "@/engine";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/**
 * Re-checks an adopted alternative against the mark's current loads, lengths and price book. When
 * it still passes, its stored figures are refreshed and it is current again; when it fails, it
 * stays stale and the check says why.
 */
export const POST = handler({}, async ({ user, params }) => {
  const access = await authorizeAlternative(user, params.alternativeId ?? "", "runSearch");
  const inputs = await requireMarkInputs(access.markId);
  const design = designFromCandidateId(access.alternative.candidateId, inputs.project.cover);
  const check = checkMember(buildMarkCheckInput(inputs, design));
  let row = access.alternative;
  if (check.pass) {
    const previous = (access.alternative.candidate ?? {}) as Record<string, unknown>;
    const candidate = {
      ...previous,
      utilization: check.utilization,
      governing: check.governing,
      ...(check.cost ? { cost: check.cost.total, costBreakdown: check.cost.breakdown } : {}),
      ...(check.carbon ? { carbon: check.carbon.total } : {}),
    };
    row = (await refreshAlternative(row.id, fingerprintMark(inputs), inputs.priceBook?.id ?? null, candidate)) ?? row;
    await recordAudit({
      workspaceId: access.workspaceId,
      userId: access.user.id,
      action: "alternative.recheck",
      entity: "adopted_alternative",
      entityId: row.id,
      before: { candidate: previous },
      after: { candidate },
    });
  }
  return { pass: check.pass, check, alternative: toAlternativeView(row, fingerprintMark(inputs)) };
});
