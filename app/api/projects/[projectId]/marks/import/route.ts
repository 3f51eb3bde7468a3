import { NextResponse } from "next/server";
import { handler } from "@/lib/api/handler";
import { authorizeProject } from "@/lib/authz";
import { getProject } from "@/db/queries/projects";
import { marksByLabel } from "@/db/queries/marks";
import { csvImportSchema } from "@/lib/validation/csv";
import { importMarksCsv } from "@/lib/csv/import-marks";
import type { UnitSystem } from "@/lib/validation/project";

/** Many column marks from one CSV: preview, then commit (all rows or none unless skipInvalid). */
export const POST = handler({ body: csvImportSchema }, async ({ user, params, body }) => {
  const access = await authorizeProject(user, params.projectId ?? "", body.mode === "commit" ? "editMarks" : "read");
  const project = await getProject(access.projectId);
  const existing = await marksByLabel(access.projectId);
  const report = await importMarksCsv(
    { projectId: access.projectId, workspaceId: access.workspaceId, userId: access.user.id, units: project.units as UnitSystem, defaultCover: project.cover, existing },
    body,
  );
  if (body.mode === "commit" && !report.committed) {
    const issues = [
      ...report.fileErrors.map((message) => ({ path: "file", message })),
      ...report.rows.flatMap((r) => r.errors.map((e) => ({ path: `rows.${e.row}.${e.column}`, message: `row ${e.row}, ${e.column}: ${e.message}` }))),
    ];
    return NextResponse.json({ error: "no marks were imported: fix the rows marked below or choose to skip them", issues, report }, { status: 422 });
  }
  return NextResponse.json({ report }, { status: report.committed ? 201 : 200 });
});
