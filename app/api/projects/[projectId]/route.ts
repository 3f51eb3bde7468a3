import { z } from "zod";
import { handler } from "@/lib/api/handler";
import { authorizeProject } from "@/lib/authz";
import { deleteProject, getProject, updateProject } from "@/db/queries/projects";
import { latestPriceBook } from "@/db/queries/price-books";
import { projectUpdateSchema } from "@/lib/validation/project";
import { roleAllows } from "@/lib/permissions";

/** A project with its latest price book and what the caller's role may do in it. */
export const GET = handler({}, async ({ user, params }) => {
  const access = await authorizeProject(user, params.projectId ?? "", "read");
  const [project, priceBook] = await Promise.all([getProject(access.projectId), latestPriceBook(access.projectId)]);
  return {
    project,
    priceBook,
    role: access.role,
    can: {
      editProject: roleAllows(access.role, "editProject"),
      editMarks: roleAllows(access.role, "editMarks"),
      editLoads: roleAllows(access.role, "editLoads"),
      editPriceBook: roleAllows(access.role, "editPriceBook"),
      deleteProject: roleAllows(access.role, "deleteProject"),
    },
  };
});

export const PATCH = handler({ body: projectUpdateSchema }, async ({ user, params, body }) => {
  const access = await authorizeProject(user, params.projectId ?? "", "editProject");
  return { project: await updateProject(access.projectId, body, access.user.id) };
});

export const DELETE = handler({ query: z.object({ version: z.coerce.number().int().min(1, "version is the one you read") }) }, async ({ user, params, query }) => {
  const access = await authorizeProject(user, params.projectId ?? "", "deleteProject");
  await deleteProject(access.projectId, query.version, access.user.id);
  return { ok: true };
});
