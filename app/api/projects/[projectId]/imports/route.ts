import { handler } from "@/lib/api/handler";
import { authorizeProject } from "@/lib/authz";
import { listLoadImports } from "@/db/queries/load-imports";

/** Every CSV import of the project, newest first (the files themselves at /imports/{id}). */
export const GET = handler({}, async ({ user, params }) => {
  const access = await authorizeProject(user, params.projectId ?? "", "read");
  return { imports: await listLoadImports(access.projectId) };
});
