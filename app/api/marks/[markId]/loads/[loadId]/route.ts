import { z } from "zod";
import { handler } from "@/lib/api/handler";
import { authorizeMark } from "@/lib/authz";
import { deleteLoad, getLoad, replaceLoad, updateLoad } from "@/db/queries/load-combinations";
import { getMark } from "@/db/queries/marks";
import { notFound, unprocessable } from "@/lib/api/errors";
import { loadCombinationCreateSchema, loadCombinationUpdateSchema, swayPartIssues } from "@/lib/validation/load-combination";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

function loadIdOf(params: Record<string, string>): string {
  const id = params.loadId ?? "";
  if (!UUID.test(id)) throw notFound("load combination not found");
  return id;
}

export const GET = handler({}, async ({ user, params }) => {
  const access = await authorizeMark(user, params.markId ?? "", "read");
  return { load: await getLoad(access.markId, loadIdOf(params)) };
});

/** Replace the whole row (the table's save): My absent means no moment about y. */
export const PUT = handler(
  { body: loadCombinationCreateSchema.extend({ version: z.number().int().min(1, "version is the one you read") }) },
  async ({ user, params, body }) => {
    const access = await authorizeMark(user, params.markId ?? "", "editLoads");
    const mark = await getMark(access.markId);
    const issues = swayPartIssues(body, mark.member.braced);
    if (issues.length > 0) throw unprocessable("sway parts are for sway columns only", issues);
    return { load: await replaceLoad(access.markId, loadIdOf(params), body, access.user.id, access.workspaceId) };
  },
);

export const PATCH = handler({ body: loadCombinationUpdateSchema }, async ({ user, params, body }) => {
  const access = await authorizeMark(user, params.markId ?? "", "editLoads");
  const mark = await getMark(access.markId);
  const issues = swayPartIssues(body, mark.member.braced);
  if (issues.length > 0) throw unprocessable("sway parts are for sway columns only", issues);
  return { load: await updateLoad(access.markId, loadIdOf(params), body, access.user.id, access.workspaceId) };
});

export const DELETE = handler({ query: z.object({ version: z.coerce.number().int().min(1, "version is the one you read") }) }, async ({ user, params, query }) => {
  const access = await authorizeMark(user, params.markId ?? "", "editLoads");
  await deleteLoad(access.markId, loadIdOf(params), query.version, access.user.id, access.workspaceId);
  return { ok: true };
});
