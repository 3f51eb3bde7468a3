import { z } from "zod";
import { handler } from "@/lib/api/handler";
import { authorizeSearch } from "@/lib/authz-search";
import { listCandidates } from "@/db/queries/searches";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

const querySchema = z.object({ front: z.enum(["0", "1"]).optional() }).strict();

/** The stored passing candidates of a finished search (front members flagged), cheapest first. */
export const GET = handler({ query: querySchema }, async ({ user, params, query }) => {
  const { search } = await authorizeSearch(user, params.searchId ?? "", "read");
  const rows = await listCandidates(search.id, { frontOnly: query.front === "1" });
  return {
    status: search.status,
    candidates: rows.map((r) => ({ ...(r.data as object), onFront: r.onFront })),
  };
});
