import { NextResponse } from "next/server";
import { handler } from "@/lib/api/handler";
import { authorizeProject } from "@/lib/authz";
import { readProjectSearchResults } from "@/db/queries/project-searches";
import { readMarkInputs } from "@/db/queries/search-inputs";
import { queueSearchForMark } from "@/lib/jobs/queue-search";
import { recordAudit } from "@/lib/audit";
import { HttpError } from "@/lib/api/errors";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** Queues a default search for every mark of the project that has no finished one yet. */
export const POST = handler({}, async ({ user, params }) => {
  const access = await authorizeProject(user, params.projectId ?? "", "runSearch");
  const results = await readProjectSearchResults(access.projectId);
  const queued: Array<{ markId: string; label: string; searchId: string }> = [];
  const skipped: Array<{ markId: string; label: string; reason: string }> = [];
  for (const { mark, search } of results) {
    if (search) continue;
    const inputs = await readMarkInputs(mark.id);
    if (!inputs) continue;
    try {
      const row = await queueSearchForMark(inputs, {}, access.user.id);
      queued.push({ markId: mark.id, label: mark.label, searchId: row.id });
    } catch (error) {
      if (!(error instanceof HttpError)) throw error;
      skipped.push({ markId: mark.id, label: mark.label, reason: error.issues[0]?.message ?? error.message });
    }
  }
  await recordAudit({
    workspaceId: access.workspaceId,
    userId: access.user.id,
    action: "search.start-missing",
    entity: "project",
    entityId: access.projectId,
    after: { queued: queued.map((q) => q.searchId) },
  });
  return NextResponse.json({ queued, skipped }, { status: queued.length > 0 ? 201 : 200 });
});
