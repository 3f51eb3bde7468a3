import { handler } from "@/lib/api/handler";
import { authorizeProject } from "@/lib/authz";
import { listPriceBooks, writePriceBook } from "@/db/queries/price-books";
import { priceBookWriteSchema } from "@/lib/validation/price-book";

/** The latest revision and the history (newest first). */
export const GET = handler({}, async ({ user, params }) => {
  const access = await authorizeProject(user, params.projectId ?? "", "read");
  const revisions = await listPriceBooks(access.projectId);
  return { priceBook: revisions[0] ?? null, revisions };
});

/** A new revision; `baseRevision` must be the latest or the write is refused with 409. */
export const POST = handler({ body: priceBookWriteSchema }, async ({ user, params, body }) => {
  const access = await authorizeProject(user, params.projectId ?? "", "editPriceBook");
  const priceBook = await writePriceBook(access.projectId, body, access.user.id);
  return Response.json({ priceBook }, { status: 201 });
});
