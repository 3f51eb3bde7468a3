import { handler } from "@/lib/api/handler";
import { authorizeSearch } from "@/lib/authz-search";
import { readMarkInputs } from "@/db/queries/search-inputs";
import { fingerprintMark } from "@/lib/search-request";
import { toSearchView } from "@/lib/search-view";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** Status and live progress of one search (polled by the client). */
export const GET = handler({}, async ({ user, params }) => {
  const { search } = await authorizeSearch(user, params.searchId ?? "", "read");
  const inputs = await readMarkInputs(search.markId);
  return { search: toSearchView(search, inputs ? fingerprintMark(inputs) : null) };
});
