import { z } from "zod";
import { handler } from "@/lib/api/handler";
import { notFound } from "@/lib/api/errors";
import { authorizeProject } from "@/lib/authz";
import { buildSchedule } from "@/lib/schedule/build-schedule";
import { scheduleFileName, scheduleToCsv } from "@/lib/schedule/schedule-csv";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

const scheduleQuerySchema = z.object({ format: z.enum(["json", "csv"], { error: 'format is "json" or "csv"' }).default("json") });

/** The project's column schedule: JSON, or `?format=csv` as a download. */
export const GET = handler({ query: scheduleQuerySchema }, async ({ user, params, query }) => {
  const access = await authorizeProject(user, params.projectId ?? "", "downloadReport");
  const schedule = await buildSchedule(access.projectId);
  if (!schedule) throw notFound("project not found");
  if (query.format === "json") return schedule;
  // The byte-order mark lets spreadsheet programs read the units (yd³, ft²) as UTF-8.
  return new Response("\uFEFF" + scheduleToCsv(schedule), {
    status: 200,
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${scheduleFileName(schedule.project.name)}"`,
      "cache-control": "no-store",
    },
  });
});
