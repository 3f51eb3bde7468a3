import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startThrowawayCluster, type ThrowawayCluster } from "./support/throwaway-cluster";

// This file points the app's pool at a cluster of its own, so stopping it affects no other test.
let cluster: ThrowawayCluster;

beforeAll(() => {
  cluster = startThrowawayCluster(54349);
  process.env.DATABASE_URL = cluster.url;
});

afterAll(async () => {
  const { closeDb } = await import("@/db/client");
  await closeDb();
  cluster.remove();
});

describe("GET /api/health", () => {
  it("answers ok with the database up after a real query, and 503 down once it is stopped", async () => {
    const { GET } = await import("@/app/api/health/route");
    const up = await GET();
    expect(up.status).toBe(200);
    expect(await up.json()).toEqual({ ok: true, db: "up" });

    cluster.stop();
    const down = await GET();
    expect(down.status).toBe(503);
    expect(await down.json()).toEqual({ ok: false, db: "down" });
  });
});
