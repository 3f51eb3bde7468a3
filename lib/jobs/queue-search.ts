/** Stores a mark's search request and queues it for a worker: the one way a search starts. */
import type { MarkInputs } from "@/db/queries/search-inputs";
import { insertSearch, setSearchJobId, type SearchRow } from "@/db/queries/searches";
import { buildSearchRequest, fingerprintMark, type StartSearch } from "../search-request";
import { enqueueSearch } from "./search-queue";

export async function queueSearchForMark(inputs: MarkInputs, choice: StartSearch, userId: string): Promise<SearchRow> {
  const request = buildSearchRequest(inputs, choice);
  const search = await insertSearch({
    markId: inputs.mark.id,
    request,
    inputsHash: fingerprintMark(inputs),
    priceBookId: inputs.priceBook?.id ?? null,
    createdBy: userId,
  });
  const jobId = await enqueueSearch(search.id);
  await setSearchJobId(search.id, jobId);
  return { ...search, jobId };
}
