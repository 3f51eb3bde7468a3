import { handler } from "@/lib/api/handler";
import { authorizeMark } from "@/lib/authz";
import { getMark, projectOf } from "@/db/queries/marks";
import { listLoads, toLoadCase } from "@/db/queries/load-combinations";
import { latestPriceBook } from "@/db/queries/price-books";
import { composeCheckInput } from "@/lib/validation/mark";

/**
 * The contract's check JSON (US units) for the mark's current design, with the price book
 * revision it names, so the check view can POST it to /api/check and show what it used.
 */
export const GET = handler({}, async ({ user, params }) => {
  const access = await authorizeMark(user, params.markId ?? "", "read");
  const [mark, loads, project, priceBook] = await Promise.all([
    getMark(access.markId),
    listLoads(access.markId),
    projectOf(access.markId),
    latestPriceBook(access.projectId),
  ]);
  const { input, notes } = composeCheckInput({ project, mark, loads: loads.map(toLoadCase), priceBook });
  return {
    input,
    notes,
    priceBook: priceBook ? { id: priceBook.id, revision: priceBook.revision } : null,
    mark: { id: mark.id, label: mark.label, level: mark.level, version: mark.version, quantity: mark.quantity, limits: mark.limits },
    project: { id: project.id, name: project.name, units: project.units, codeBasis: project.codeBasis },
  };
});
