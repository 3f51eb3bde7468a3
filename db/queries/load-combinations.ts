/**
 * Load combinations of a column mark, in kip and kip-in. Names are unique within a mark (the
 * check reports the governing combination by name). Writes are optimistic per row (version).
 */
import { and, asc, eq, inArray, max } from "drizzle-orm";
import { getDb, type Database } from "../client";
import { loadCombinations } from "../schema";
import { recordAudit } from "@/lib/audit";
import { conflict, notFound, unprocessable } from "@/lib/api/errors";
import type { EndMoments, LoadCase } from "@/engine/types";
import type { LoadCombinationCreate, LoadCombinationUpdate } from "@/lib/validation/load-combination";
import { bumpMark } from "./marks";

type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];

export interface LoadCombination extends LoadCase {
  id: string;
  markId: string;
  position: number;
  importId: string | null;
  createdAt: Date;
  updatedAt: Date;
  version: number;
}

export function toLoad(row: typeof loadCombinations.$inferSelect): LoadCombination {
  return {
    id: row.id,
    markId: row.markId,
    position: row.position,
    name: row.name,
    Pu: row.Pu,
    betaDns: row.betaDns,
    Mx: row.Mx as EndMoments,
    ...(row.My ? { My: row.My as EndMoments } : {}),
    importId: row.importId,
    createdAt: row.createdAt,
    updatedAt: row.updatedAt,
    version: row.version,
  };
}

/** The contract's load case of a stored combination (no ids, no bookkeeping). */
export function toLoadCase(load: LoadCombination): LoadCase {
  return { name: load.name, Pu: load.Pu, betaDns: load.betaDns, Mx: load.Mx, ...(load.My ? { My: load.My } : {}) };
}

export async function listLoads(markId: string): Promise<LoadCombination[]> {
  const rows = await getDb()
    .select()
    .from(loadCombinations)
    .where(eq(loadCombinations.markId, markId))
    .orderBy(asc(loadCombinations.position), asc(loadCombinations.createdAt));
  return rows.map(toLoad);
}

async function assertNameFree(tx: Tx, markId: string, name: string, exceptId?: string): Promise<void> {
  const same = await tx
    .select({ id: loadCombinations.id })
    .from(loadCombinations)
    .where(and(eq(loadCombinations.markId, markId), eq(loadCombinations.name, name)));
  if (same.some((r) => r.id !== exceptId)) {
    throw unprocessable(`a load combination named "${name}" already exists for this mark`, [{ path: "name", message: `"${name}" is already used by another row` }]);
  }
}

export async function createLoad(markId: string, input: LoadCombinationCreate, userId: string, workspaceId: string): Promise<LoadCombination> {
  return getDb().transaction(async (tx) => {
    await assertNameFree(tx, markId, input.name);
    let position = input.position;
    if (position === undefined) {
      const [row] = await tx.select({ last: max(loadCombinations.position) }).from(loadCombinations).where(eq(loadCombinations.markId, markId));
      position = (row?.last ?? -1) + 1;
    }
    const [row] = await tx
      .insert(loadCombinations)
      .values({ markId, position, name: input.name, Pu: input.Pu, betaDns: input.betaDns, Mx: input.Mx, My: input.My ?? null })
      .returning();
    if (!row) throw new Error("load insert returned nothing");
    await bumpMark(tx, markId);
    const load = toLoad(row);
    await recordAudit({ workspaceId, userId, action: "create", entity: "load_combination", entityId: load.id, after: load }, tx);
    return load;
  });
}

export async function getLoad(markId: string, loadId: string): Promise<LoadCombination> {
  const [row] = await getDb().select().from(loadCombinations).where(and(eq(loadCombinations.id, loadId), eq(loadCombinations.markId, markId)));
  if (!row) throw notFound("load combination not found");
  return toLoad(row);
}

type LoadSet = Partial<typeof loadCombinations.$inferInsert>;

/**
 * The one optimistic write of a row: lock it, refuse a stale version (409 with the current row),
 * keep names unique, apply the fields, bump the mark and audit before and after.
 */
async function writeLoad(
  markId: string,
  loadId: string,
  version: number,
  fields: (before: LoadCombination) => { set: LoadSet; name: string },
  userId: string,
  workspaceId: string,
): Promise<LoadCombination> {
  return getDb().transaction(async (tx) => {
    const [beforeRow] = await tx
      .select()
      .from(loadCombinations)
      .where(and(eq(loadCombinations.id, loadId), eq(loadCombinations.markId, markId)))
      .for("update");
    if (!beforeRow) throw notFound("load combination not found");
    const before = toLoad(beforeRow);
    if (before.version !== version) {
      throw conflict(`load combination "${before.name}" was changed by someone else (you had version ${version}, it is now ${before.version})`, before);
    }
    const { set, name } = fields(before);
    if (name !== before.name) await assertNameFree(tx, markId, name, loadId);
    const [afterRow] = await tx
      .update(loadCombinations)
      .set({ ...set, version: before.version + 1, updatedAt: new Date() })
      .where(and(eq(loadCombinations.id, loadId), eq(loadCombinations.version, version)))
      .returning();
    if (!afterRow) throw conflict(`load combination "${before.name}" was changed by someone else`, before);
    await bumpMark(tx, markId);
    const after = toLoad(afterRow);
    await recordAudit({ workspaceId, userId, action: "update", entity: "load_combination", entityId: loadId, before, after }, tx);
    return after;
  });
}

/** Change the fields given; the rest stay as stored. */
export async function updateLoad(markId: string, loadId: string, patch: LoadCombinationUpdate, userId: string, workspaceId: string): Promise<LoadCombination> {
  const { version, ...changes } = patch;
  return writeLoad(
    markId,
    loadId,
    version,
    (before) => {
      const set: LoadSet = {};
      if (changes.name !== undefined) set.name = changes.name;
      if (changes.Pu !== undefined) set.Pu = changes.Pu;
      if (changes.betaDns !== undefined) set.betaDns = changes.betaDns;
      if (changes.Mx !== undefined) set.Mx = changes.Mx;
      // An explicit My replaces the stored one; "My" absent from the patch leaves it. Clearing My is a full-row PUT.
      if (changes.My !== undefined) set.My = changes.My;
      if (changes.position !== undefined) set.position = changes.position;
      return { set, name: changes.name ?? before.name };
    },
    userId,
    workspaceId,
  );
}

/** Replace every field of a row (My absent = no moment about y), still optimistic. */
export async function replaceLoad(
  markId: string,
  loadId: string,
  input: LoadCombinationCreate & { version: number },
  userId: string,
  workspaceId: string,
): Promise<LoadCombination> {
  const { version, ...row } = input;
  return writeLoad(
    markId,
    loadId,
    version,
    () => ({
      set: {
        name: row.name,
        Pu: row.Pu,
        betaDns: row.betaDns,
        Mx: row.Mx,
        My: row.My ?? null,
        ...(row.position !== undefined ? { position: row.position } : {}),
      },
      name: row.name,
    }),
    userId,
    workspaceId,
  );
}

export async function deleteLoad(markId: string, loadId: string, version: number, userId: string, workspaceId: string): Promise<void> {
  await getDb().transaction(async (tx) => {
    const [beforeRow] = await tx
      .select()
      .from(loadCombinations)
      .where(and(eq(loadCombinations.id, loadId), eq(loadCombinations.markId, markId)))
      .for("update");
    if (!beforeRow) throw notFound("load combination not found");
    if (beforeRow.version !== version) throw conflict(`load combination "${beforeRow.name}" was changed by someone else`, toLoad(beforeRow));
    await tx.delete(loadCombinations).where(eq(loadCombinations.id, loadId));
    await bumpMark(tx, markId);
    await recordAudit({ workspaceId, userId, action: "delete", entity: "load_combination", entityId: loadId, before: toLoad(beforeRow) }, tx);
  });
}

/** Write imported rows for several marks inside the caller's transaction (replace or append). */
export async function writeImportedLoads(
  tx: Tx,
  byMark: Map<string, LoadCase[]>,
  importId: string,
  replace: boolean,
): Promise<number> {
  let written = 0;
  const markIds = [...byMark.keys()];
  if (markIds.length === 0) return 0;
  if (replace) await tx.delete(loadCombinations).where(inArray(loadCombinations.markId, markIds));
  for (const [markId, loads] of byMark) {
    let position = 0;
    if (!replace) {
      const existing = await tx
        .select({ name: loadCombinations.name, position: loadCombinations.position })
        .from(loadCombinations)
        .where(eq(loadCombinations.markId, markId));
      const names = new Set(existing.map((e) => e.name));
      const clash = loads.find((l) => names.has(l.name));
      if (clash) {
        throw unprocessable(`the mark already has a combination named "${clash.name}": replace the existing rows or rename it`, [
          { path: "combination", message: `"${clash.name}" already exists for this mark` },
        ]);
      }
      position = existing.reduce((m, e) => Math.max(m, e.position + 1), 0);
    }
    if (loads.length > 0) {
      await tx.insert(loadCombinations).values(
        loads.map((l, i) => ({ markId, position: position + i, name: l.name, Pu: l.Pu, betaDns: l.betaDns, Mx: l.Mx, My: l.My ?? null, importId })),
      );
    }
    await bumpMark(tx, markId);
    written += loads.length;
  }
  return written;
}
