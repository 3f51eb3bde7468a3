import { NextResponse } from "next/server";
import { handler } from "@/lib/api/handler";
import { authorizeMark } from "@/lib/authz";
import { getMark, projectOf } from "@/db/queries/marks";
import { csvImportSchema } from "@/lib/validation/csv";
import { importLoadCsv, reportIssues } from "@/lib/csv/import-loads";
import type { UnitSystem } from "@/lib/validation/project";

/** Load combinations of one mark from a CSV: preview, then commit (all rows or none unless skipInvalid). */
export const POST = handler({ body: csvImportSchema }, async ({ user, params, body }) => {
  const access = await authorizeMark(user, params.markId ?? "", body.mode === "commit" ? "editLoads" : "read");
  const [mark, project] = await Promise.all([getMark(access.markId), projectOf(access.markId)]);
  const report = await importLoadCsv(
    { projectId: access.projectId, workspaceId: access.workspaceId, userId: access.user.id, units: project.units as UnitSystem, mark, marks: [mark] },
    body,
  );
  if (body.mode === "commit" && !report.committed) {
    return NextResponse.json({ error: "nothing was imported: fix the rows marked below or choose to skip them", issues: reportIssues(report), report }, { status: 422 });
  }
  return NextResponse.json({ report }, { status: report.committed ? 201 : 200 });
});
