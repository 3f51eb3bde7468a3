import { handler } from "@/lib/api/handler";
import { authorizeProject } from "@/lib/authz";
import { getLoadImport } from "@/db/queries/load-imports";
import { notFound } from "@/lib/api/errors";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** The original file of an import, exactly as uploaded. */
export const GET = handler({}, async ({ user, params }) => {
  const access = await authorizeProject(user, params.projectId ?? "", "read");
  if (!UUID.test(params.importId ?? "")) throw notFound("import not found");
  const row = await getLoadImport(access.projectId, params.importId ?? "");
  const safeName = row.filename.replace(/[^A-Za-z0-9._-]+/g, "_");
  return new Response(row.content, {
    headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": `attachment; filename="${safeName}"` },
  });
});
