/**
 * Adopted alternatives of a mark: estimators (and engineers) propose, engineers approve or reject.
 * Approving writes the candidate's design onto the mark and supersedes the earlier approval, in one
 * transaction with optimistic concurrency on both rows.
 */
import { and, desc, eq, inArray, ne, sql } from "drizzle-orm";
import { getDb } from "../client";
import { adoptedAlternatives, columnMarks, memberships, users } from "../schema";
import { conflict, notFound } from "@/lib/api/errors";
import type { Role } from "@/lib/permissions";

export type AlternativeRow = typeof adoptedAlternatives.$inferSelect;

export interface NewAlternative {
  markId: string;
  searchId: string | null;
  candidateId: string;
  candidate: unknown;
  inputsHash: string;
  priceBookId: string | null;
  proposedBy: string;
  comment: string;
}

export async function insertProposal(values: NewAlternative): Promise<AlternativeRow> {
  const [row] = await getDb().insert(adoptedAlternatives).values({ ...values, status: "proposed" }).returning();
  if (!row) throw new Error("proposal insert returned nothing");
  return row;
}

export async function listAlternativesOfMark(markId: string): Promise<AlternativeRow[]> {
  return getDb().select().from(adoptedAlternatives).where(eq(adoptedAlternatives.markId, markId)).orderBy(desc(adoptedAlternatives.createdAt));
}

export async function findAlternative(id: string): Promise<AlternativeRow | null> {
  const [row] = await getDb().select().from(adoptedAlternatives).where(eq(adoptedAlternatives.id, id));
  return row ?? null;
}

export interface Decision {
  id: string;
  version: number;
  decision: "approve" | "reject";
  comment: string;
  decidedBy: string;
  /** the design written onto the mark when approving */
  design: unknown;
}

export async function decideAlternative(d: Decision): Promise<AlternativeRow> {
  return getDb().transaction(async (tx) => {
    const [current] = await tx.select().from(adoptedAlternatives).where(eq(adoptedAlternatives.id, d.id)).for("update");
    if (!current) throw notFound("alternative not found");
    if (current.version !== d.version) throw conflict("this alternative changed since you read it", current);
    if (current.status !== "proposed") throw conflict(`this alternative is already ${current.status}`, current);
    const now = new Date();
    const [decided] = await tx
      .update(adoptedAlternatives)
      .set({
        status: d.decision === "approve" ? "approved" : "rejected",
        decidedBy: d.decidedBy,
        decidedAt: now,
        comment: d.comment || current.comment,
        updatedAt: now,
        version: sql`${adoptedAlternatives.version} + 1`,
      })
      .where(eq(adoptedAlternatives.id, d.id))
      .returning();
    if (!decided) throw notFound("alternative not found");
    if (d.decision === "approve") {
      await tx
        .update(adoptedAlternatives)
        .set({ status: "superseded", updatedAt: now, version: sql`${adoptedAlternatives.version} + 1` })
        .where(
          and(
            eq(adoptedAlternatives.markId, current.markId),
            eq(adoptedAlternatives.status, "approved"),
            ne(adoptedAlternatives.id, d.id),
          ),
        );
      await tx
        .update(columnMarks)
        .set({ design: d.design, updatedAt: now, version: sql`${columnMarks.version} + 1` })
        .where(eq(columnMarks.id, current.markId));
    }
    return decided;
  });
}

/** After a successful re-check the alternative is current again for the mark's present inputs. */
export async function refreshAlternative(id: string, inputsHash: string, priceBookId: string | null, candidate: unknown) {
  const [row] = await getDb()
    .update(adoptedAlternatives)
    .set({ inputsHash, priceBookId, candidate, updatedAt: new Date(), version: sql`${adoptedAlternatives.version} + 1` })
    .where(eq(adoptedAlternatives.id, id))
    .returning();
  return row ?? null;
}

/** E-mail addresses of the workspace members holding any of these roles. */
export async function teamAddresses(workspaceId: string, roles: Role[]): Promise<string[]> {
  const rows = await getDb()
    .select({ email: users.email })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.workspaceId, workspaceId), inArray(memberships.role, roles)));
  return rows.map((r) => r.email);
}
