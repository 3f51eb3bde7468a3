import { z } from "zod";
import { handler } from "@/lib/api/handler";
import { authorizeMark } from "@/lib/authz";
import { deleteMark, getMark, projectOf, updateMark } from "@/db/queries/marks";
import { listLoads } from "@/db/queries/load-combinations";
import { markUpdateSchema } from "@/lib/validation/mark";
import { roleAllows } from "@/lib/permissions";

/** A mark with its load combinations and its project's settings. */
export const GET = handler({}, async ({ user, params }) => {
  const access = await authorizeMark(user, params.markId ?? "", "read");
  const [mark, loads, project] = await Promise.all([getMark(access.markId), listLoads(access.markId), projectOf(access.markId)]);
  return {
    mark,
    loads,
    project,
    role: access.role,
    can: { editMarks: roleAllows(access.role, "editMarks"), editLoads: roleAllows(access.role, "editLoads") },
  };
});

export const PATCH = handler({ body: markUpdateSchema }, async ({ user, params, body }) => {
  const access = await authorizeMark(user, params.markId ?? "", "editMarks");
  return { mark: await updateMark(access.markId, body, access.user.id, access.workspaceId) };
});

export const DELETE = handler({ query: z.object({ version: z.coerce.number().int().min(1, "version is the one you read") }) }, async ({ user, params, query }) => {
  const access = await authorizeMark(user, params.markId ?? "", "editMarks");
  await deleteMark(access.markId, query.version, access.user.id, access.workspaceId);
  return { ok: true };
});
