/**
 * Price books are append-only revisions: an edit writes revision n + 1, so every result can name
 * the exact prices it used. A write based on an older revision than the latest is refused (409).
 */
import { desc, eq } from "drizzle-orm";
import { getDb } from "../client";
import { priceBooks, projects } from "../schema";
import { recordAudit } from "@/lib/audit";
import { conflict, notFound } from "@/lib/api/errors";
import type { PriceBookWrite } from "@/lib/validation/price-book";
import type { CarbonFactors, Prices } from "@/engine/types";

export interface PriceBook {
  id: string;
  projectId: string;
  revision: number;
  prices: Prices;
  carbon: CarbonFactors;
  formSet: number;
  createdBy: string | null;
  createdAt: Date;
}

function toPriceBook(row: typeof priceBooks.$inferSelect): PriceBook {
  return {
    id: row.id,
    projectId: row.projectId,
    revision: row.revision,
    prices: row.prices as Prices,
    carbon: row.carbon as CarbonFactors,
    formSet: row.formSet,
    createdBy: row.createdBy,
    createdAt: row.createdAt,
  };
}

export async function latestPriceBook(projectId: string): Promise<PriceBook | null> {
  const [row] = await getDb().select().from(priceBooks).where(eq(priceBooks.projectId, projectId)).orderBy(desc(priceBooks.revision)).limit(1);
  return row ? toPriceBook(row) : null;
}

export async function listPriceBooks(projectId: string): Promise<PriceBook[]> {
  const rows = await getDb().select().from(priceBooks).where(eq(priceBooks.projectId, projectId)).orderBy(desc(priceBooks.revision));
  return rows.map(toPriceBook);
}

export async function writePriceBook(projectId: string, input: PriceBookWrite, userId: string): Promise<PriceBook> {
  return getDb().transaction(async (tx) => {
    // Lock the project row so two editors cannot both write revision n + 1.
    const [project] = await tx.select({ workspaceId: projects.workspaceId }).from(projects).where(eq(projects.id, projectId)).for("update");
    if (!project) throw notFound("project not found");
    const [latest] = await tx.select().from(priceBooks).where(eq(priceBooks.projectId, projectId)).orderBy(desc(priceBooks.revision)).limit(1);
    const current = latest?.revision ?? 0;
    if (current !== input.baseRevision) {
      throw conflict(`the price book was changed by someone else (you edited revision ${input.baseRevision}, the latest is ${current})`, latest ? toPriceBook(latest) : null);
    }
    const [row] = await tx
      .insert(priceBooks)
      .values({ projectId, revision: current + 1, prices: input.prices, carbon: input.carbon, formSet: input.formSet, createdBy: userId })
      .returning();
    if (!row) throw new Error("price book insert returned nothing");
    await recordAudit(
      { workspaceId: project.workspaceId, userId, action: "revise", entity: "price_book", entityId: row.id, before: latest ?? null, after: row },
      tx,
    );
    return toPriceBook(row);
  });
}
