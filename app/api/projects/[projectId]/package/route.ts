import { handler } from "@/lib/api/handler";
import { notFound } from "@/lib/api/errors";
import { authorizeProject } from "@/lib/authz";
import { renderProjectPackage } from "@/lib/reports/render-package";
import { pdfResponse } from "@/lib/reports/pdf-response";
import { findProjectName } from "@/lib/reports/find-names";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** The project's calculation package (PDF): a contents page, then one part per column mark. */
export const GET = handler({}, async ({ user, params }) => {
  const access = await authorizeProject(user, params.projectId ?? "", "downloadReport");
  const pdf = await renderProjectPackage(access.projectId);
  const name = await findProjectName(access.projectId);
  if (!pdf || name === null) throw notFound("project not found");
  return pdfResponse(pdf, `${name}-calculation-package.pdf`);
});
