import { NextResponse } from "next/server";
import { handler } from "@/lib/api/handler";
import { authorizeProject } from "@/lib/authz";
import { getProject } from "@/db/queries/projects";
import { marksByLabel } from "@/db/queries/marks";
import { csvImportSchema } from "@/lib/validation/csv";
import { importLoadCsv, reportIssues } from "@/lib/csv/import-loads";
import type { UnitSystem } from "@/lib/validation/project";

/**
 * Load combinations of many marks from one CSV (a `mark` column, and `level` where labels
 * repeat). Preview reports every row; commit writes all rows in one transaction or none.
 */
export const POST = handler({ body: csvImportSchema }, async ({ user, params, body }) => {
  const access = await authorizeProject(user, params.projectId ?? "", body.mode === "commit" ? "editLoads" : "read");
  const project = await getProject(access.projectId);
  const report = await importLoadCsv(
    { projectId: access.projectId, workspaceId: access.workspaceId, userId: access.user.id, units: project.units as UnitSystem, mark: null, marks: await marksByLabel(access.projectId) },
    body,
  );
  if (body.mode === "commit" && !report.committed) {
    return NextResponse.json({ error: "nothing was imported: fix the rows marked below or choose to skip them", issues: reportIssues(report), report }, { status: 422 });
  }
  return NextResponse.json({ report }, { status: report.committed ? 201 : 200 });
});
