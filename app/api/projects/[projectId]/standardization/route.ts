import { handler } from "@/lib/api/handler";
import { authorizeProject } from "@/lib/authz";
import { latestPriceBook } from "@/db/queries/price-books";
import { standardizationQuerySchema } from "@/lib/validation/standardization";
import { gatherStandardization, sweepProject } from "@/lib/standardize/project-standardization";
import { CAUTION, CODE_EDITION } from "@/lib/caution";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/**
 * Total cost against the number of distinct outlines (N = 1 … number of marks), each with its
 * assignment, from the marks' latest finished searches. Computation only: nothing is stored.
 */
export const POST = handler({ body: standardizationQuerySchema }, async ({ user, params, body }) => {
  const access = await authorizeProject(user, params.projectId ?? "", "read");
  const book = await latestPriceBook(access.projectId);
  const formSetCost = book?.formSet ?? 0;
  const gathered = await gatherStandardization(access.projectId, body, formSetCost);
  const sweep = sweepProject(gathered);
  return {
    formSetCost,
    priceBookRevision: book?.revision ?? null,
    missing: gathered.missing,
    stale: gathered.stale,
    sweep,
    codeEdition: CODE_EDITION,
    caution: CAUTION,
  };
});
