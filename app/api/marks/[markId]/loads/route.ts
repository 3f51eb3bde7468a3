import { handler } from "@/lib/api/handler";
import { authorizeMark } from "@/lib/authz";
import { createLoad, listLoads } from "@/db/queries/load-combinations";
import { getMark } from "@/db/queries/marks";
import { unprocessable } from "@/lib/api/errors";
import { loadCombinationCreateSchema, swayPartIssues } from "@/lib/validation/load-combination";

export const GET = handler({}, async ({ user, params }) => {
  const access = await authorizeMark(user, params.markId ?? "", "read");
  return { loads: await listLoads(access.markId) };
});

export const POST = handler({ body: loadCombinationCreateSchema }, async ({ user, params, body }) => {
  const access = await authorizeMark(user, params.markId ?? "", "editLoads");
  const mark = await getMark(access.markId);
  const issues = swayPartIssues(body, mark.member.braced);
  if (issues.length > 0) throw unprocessable("sway parts are for sway columns only", issues);
  const load = await createLoad(access.markId, body, access.user.id, access.workspaceId);
  return Response.json({ load }, { status: 201 });
});
