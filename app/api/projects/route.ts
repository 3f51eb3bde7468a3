import { handler } from "@/lib/api/handler";
import { authorizeWorkspace } from "@/lib/authz";
import { createProject, listProjects } from "@/db/queries/projects";
import { projectCreateSchema, projectListQuerySchema } from "@/lib/validation/project";
import { roleAllows } from "@/lib/permissions";

/** The projects of a workspace, with their mark counts; `canCreate` tells the page whether to offer the form. */
export const GET = handler({ query: projectListQuerySchema }, async ({ user, query }) => {
  const access = await authorizeWorkspace(user, query.workspaceId, "read");
  return { projects: await listProjects(query.workspaceId), role: access.role, canCreate: roleAllows(access.role, "editProject") };
});

export const POST = handler({ body: projectCreateSchema }, async ({ user, body }) => {
  const access = await authorizeWorkspace(user, body.workspaceId, "editProject");
  const project = await createProject(body, access.user.id);
  return Response.json({ project }, { status: 201 });
});

export type ProjectListResponse = { projects: Awaited<ReturnType<typeof listProjects>>; role: string; canCreate: boolean };
