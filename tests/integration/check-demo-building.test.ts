/**
 * The invented demo building shows what it is meant to show, through POST /api/check: the marks
 * marked "fails-with-slenderness" pass as short columns (ℓu = 12 in, so k ℓu/r is under every
 * limit of 6.2.5.1 and δ = 1) yet fail once the moment magnifier is included; the others pass.
 * The data is ours and invented; this guards the demo against engine or data changes.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "./support/database";
import { createTestUser, type TestUser } from "./support/fixtures";
import { callRoute } from "./support/session";
import * as checkRoute from "@/app/api/check/route";
import { DEMO_MARKS, DEMO_PRICE_BOOK, DEMO_PROJECT } from "@/scripts/demo-building-data";
import { applyPsi, composeCheckInput, markCreateSchema } from "@/lib/validation/mark";
import type { CheckOutput } from "@/engine/types";

// A real user: the session helper also checks that the signed-in person still exists.
let user: TestUser;
beforeAll(async () => {
  user = await createTestUser("demo");
});
afterAll(closeDb);

async function check(input: unknown): Promise<CheckOutput> {
  const res = await callRoute<CheckOutput>(checkRoute.POST, "/api/check", { method: "POST", user, body: input });
  expect(res.status).toBe(200);
  return res.json;
}

describe("the demo building", () => {
  it("has at least eight column marks, some failing only with slenderness", () => {
    expect(DEMO_MARKS.length).toBeGreaterThanOrEqual(8);
    expect(DEMO_MARKS.filter((d) => d.intent === "fails-with-slenderness").length).toBeGreaterThanOrEqual(2);
  });

  it.each(DEMO_MARKS.map((d) => [d.mark.label, d] as const))("mark %s checks as intended", async (_label, demo) => {
    const mark = markCreateSchema.parse(demo.mark);
    const { input } = composeCheckInput({ project: DEMO_PROJECT, mark: { member: applyPsi(mark.member), design: mark.design }, loads: demo.loads, priceBook: DEMO_PRICE_BOOK });
    const full = await check(input);
    expect(full.cost?.total ?? 0).toBeGreaterThan(0);
    if (demo.intent === "passes") {
      expect(full.pass, full.reasons.join("; ")).toBe(true);
    } else {
      expect(full.pass).toBe(false);
      const { lux: _x, luy: _y, braceLevels: _b, ...rest } = input.member;
      const short = await check({ ...input, member: { ...rest, lu: 12 } });
      expect(short.cases.every((c) => !c.x.slender && !c.y.slender)).toBe(true);
      expect(short.pass, short.reasons.join("; ")).toBe(demo.intent === "fails-with-slenderness");
    }
  });
});
