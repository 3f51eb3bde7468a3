import { handler } from "@/lib/api/handler";
import { notFound } from "@/lib/api/errors";
import { authorizeMark } from "@/lib/authz";
import { renderMarkPackage } from "@/lib/reports/render-package";
import { pdfResponse } from "@/lib/reports/pdf-response";
import { findMarkNames } from "@/lib/reports/find-names";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** One column mark's calculation package (PDF). */
export const GET = handler({}, async ({ user, params }) => {
  const access = await authorizeMark(user, params.markId ?? "", "downloadReport");
  const pdf = await renderMarkPackage(access.markId);
  const names = await findMarkNames(access.markId);
  if (!pdf || !names) throw notFound("column mark not found");
  return pdfResponse(pdf, `${names.project}-${names.label}-calculation.pdf`);
});
