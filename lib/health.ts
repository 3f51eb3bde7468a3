import type { Pool } from "pg";

/** Runs a real query; "down" when the database cannot answer within the pool's timeout. */
export async function probeDatabase(pool: Pool): Promise<"up" | "down"> {
  try {
    const result = await pool.query<{ ok: number }>("select 1 as ok");
    return result.rows[0]?.ok === 1 ? "up" : "down";
  } catch {
    return "down";
  }
}
