import { handler } from "@/lib/api/handler";
import { authorizeProject } from "@/lib/authz";
import { createMark, listMarks } from "@/db/queries/marks";
import { markCreateSchema } from "@/lib/validation/mark";

export const GET = handler({}, async ({ user, params }) => {
  const access = await authorizeProject(user, params.projectId ?? "", "read");
  return { marks: await listMarks(access.projectId) };
});

export const POST = handler({ body: markCreateSchema }, async ({ user, params, body }) => {
  const access = await authorizeProject(user, params.projectId ?? "", "editMarks");
  const mark = await createMark(access.projectId, body, access.user.id, access.workspaceId);
  return Response.json({ mark }, { status: 201 });
});
