import { handler } from "@/lib/api/handler";
import { conflict } from "@/lib/api/errors";
import { authorizeSearch } from "@/lib/authz-search";
import { cancelSearch, findSearch } from "@/db/queries/searches";
import { cancelSearchJob } from "@/lib/jobs/search-queue";
import { recordAudit } from "@/lib/audit";
import { toSearchView } from "@/lib/search-view";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** Cancels a queued or running search; the worker sees it within a fraction of a second. */
export const POST = handler({}, async ({ user, params }) => {
  const access = await authorizeSearch(user, params.searchId ?? "", "runSearch");
  const cancelled = await cancelSearch(access.search.id);
  if (!cancelled) throw conflict(`the search is already ${access.search.status}`, toSearchView(access.search, null));
  if (access.search.jobId) await cancelSearchJob(access.search.jobId).catch(() => undefined);
  await recordAudit({
    workspaceId: access.workspaceId,
    userId: access.user.id,
    action: "search.cancel",
    entity: "search",
    entityId: access.search.id,
    before: { status: access.search.status },
    after: { status: "cancelled" },
  });
  const row = await findSearch(access.search.id);
  return { search: row ? toSearchView(row, null) : null };
});
