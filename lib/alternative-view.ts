import type { AlternativeRow } from "@/db/queries/alternatives";

/** An adopted alternative as the client sees it, with "stale" when the mark's inputs moved on. */
export function toAlternativeView(row: AlternativeRow, currentInputsHash: string | null) {
  return {
    id: row.id,
    markId: row.markId,
    searchId: row.searchId,
    candidateId: row.candidateId,
    candidate: row.candidate,
    status: row.status,
    comment: row.comment,
    proposedBy: row.proposedBy,
    decidedBy: row.decidedBy,
    decidedAt: row.decidedAt,
    priceBookId: row.priceBookId,
    stale: currentInputsHash !== null && row.inputsHash !== currentInputsHash,
    createdAt: row.createdAt,
    version: row.version,
  };
}
