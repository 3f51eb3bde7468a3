import { afterAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { workspaces } from "@/db/schema";
import { testDb, closeDb, uniqueSuffix } from "./support/database";

afterAll(closeDb);

describe("Drizzle against the real PostgreSQL", () => {
  it("writes a row and reads it back with defaults for createdAt, updatedAt and version", async () => {
    const db = testDb();
    const slug = `roundtrip-${uniqueSuffix()}`;
    const [inserted] = await db.insert(workspaces).values({ name: "Round-trip Works", slug }).returning();
    expect(inserted?.version).toBe(1);
    const [read] = await db.select().from(workspaces).where(eq(workspaces.slug, slug));
    expect(read?.name).toBe("Round-trip Works");
    expect(read?.createdAt).toBeInstanceOf(Date);
    expect(read?.updatedAt).toBeInstanceOf(Date);
    await db.delete(workspaces).where(eq(workspaces.slug, slug));
    expect(await db.select().from(workspaces).where(eq(workspaces.slug, slug))).toEqual([]);
  });

  it("refuses a duplicate workspace slug (unique constraint)", async () => {
    const db = testDb();
    const slug = `dup-${uniqueSuffix()}`;
    await db.insert(workspaces).values({ name: "First", slug });
    await expect(db.insert(workspaces).values({ name: "Second", slug })).rejects.toThrow();
    await db.delete(workspaces).where(eq(workspaces.slug, slug));
  });
});
