import { NextResponse } from "next/server";
import { handler } from "@/lib/api/handler";
import { authorizeMark } from "@/lib/authz";
import { requireMarkInputs } from "@/db/queries/search-inputs";
import { listSearchesOfMark } from "@/db/queries/searches";
import { fingerprintMark, startSearchSchema } from "@/lib/search-request";
import { queueSearchForMark } from "@/lib/jobs/queue-search";
import { recordAudit } from "@/lib/audit";
import { toSearchView } from "@/lib/search-view";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** Searches of a mark, newest first. */
export const GET = handler({}, async ({ user, params }) => {
  const access = await authorizeMark(user, params.markId ?? "", "read");
  const inputs = await requireMarkInputs(access.markId);
  const current = fingerprintMark(inputs);
  const rows = await listSearchesOfMark(access.markId);
  return { searches: rows.map((row) => toSearchView(row, current)) };
});

/** Stores the request (space, price book, loads) and queues it for a worker. */
export const POST = handler({ body: startSearchSchema }, async ({ user, params, body }) => {
  const access = await authorizeMark(user, params.markId ?? "", "runSearch");
  const inputs = await requireMarkInputs(access.markId);
  const search = await queueSearchForMark(inputs, body, access.user.id);
  await recordAudit({
    workspaceId: access.workspaceId,
    userId: access.user.id,
    action: "search.start",
    entity: "search",
    entityId: search.id,
    after: { markId: access.markId, space: (search.request as { space?: unknown }).space ?? null },
  });
  return NextResponse.json({ search: toSearchView(search, search.inputsHash) }, { status: 201 });
});
