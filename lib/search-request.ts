/**
 * Builds the optimizer's request (cli-contract.md § optimize) for one column mark from what the
 * project stores, and the fingerprint of the inputs it depends on (stale detection).
 */
import { z } from "zod";
import type { MarkInputs } from "@/db/queries/search-inputs";
import { fingerprintInputs } from "./fingerprint";
import { spaceSchema, optimizeRequestSchema, type OptimizeRequest } from "./validation/optimize-request";
import { unprocessable } from "./api/errors";
import { zodIssues } from "./api/handler";

/** What a person may choose when starting a search; the rest comes from the mark and project. */
export const startSearchSchema = z
  .object({
    space: spaceSchema.optional(),
    threads: z.number().int().min(1).max(8).optional(),
  })
  .strict();
export type StartSearch = z.infer<typeof startSearchSchema>;

interface StoredLimits {
  maxB?: number;
  maxH?: number;
  maxD?: number;
  maxWidth?: number;
  squareOnly?: boolean;
}

const MEMBER_FIELDS = ["lu", "lux", "luy", "kx", "ky", "braced", "transverseLoad", "sway", "pourHeight"] as const;

function pickMember(member: unknown): Record<string, unknown> {
  const source = (member ?? {}) as Record<string, unknown>;
  const picked: Record<string, unknown> = {};
  for (const key of MEMBER_FIELDS) if (source[key] !== undefined && source[key] !== null) picked[key] = source[key];
  return picked;
}

/** The inputs whose change makes a stored search or an adopted alternative stale. */
export function fingerprintMark(inputs: MarkInputs): string {
  return fingerprintInputs({
    member: pickMember(inputs.mark.member),
    loads: inputs.loads.map((l) => ({ name: l.name, Pu: l.Pu, betaDns: l.betaDns, Mx: l.Mx, My: l.My ?? null })),
    priceBook: inputs.priceBook?.id ?? null,
    project: { cover: inputs.project.cover, ei: inputs.project.eiOption, dagg: inputs.project.dagg, exposure: inputs.project.exposure },
  });
}

export function buildSearchRequest(inputs: MarkInputs, choice: StartSearch): OptimizeRequest {
  if (!inputs.priceBook) throw unprocessable("the project has no price book yet", [{ path: "priceBook", message: "add a price book first" }]);
  if (inputs.loads.length === 0) throw unprocessable("the mark has no load combinations", [{ path: "loads", message: "add at least one load combination" }]);
  const limits = (inputs.mark.limits ?? {}) as StoredLimits;
  const maxWidth = [limits.maxWidth, limits.maxB, limits.maxH, limits.maxD].filter((v): v is number => typeof v === "number");
  const space = {
    cover: inputs.project.cover,
    dagg: inputs.project.dagg,
    ...(maxWidth.length > 0 ? { maxWidth: Math.min(...maxWidth) } : {}),
    ...(limits.squareOnly ? { squareOnly: true } : {}),
    ...(choice.space ?? {}),
  };
  const candidate = {
    member: pickMember(inputs.mark.member),
    loads: inputs.loads.map((l) => ({
      name: l.name,
      Pu: l.Pu,
      betaDns: l.betaDns,
      Mx: l.Mx,
      ...(l.My ? { My: l.My } : {}),
    })),
    prices: inputs.priceBook.prices,
    carbon: inputs.priceBook.carbon,
    space,
    options: {
      ei: inputs.project.eiOption,
      exposure: inputs.project.exposure,
    },
    ...(choice.threads ? { threads: choice.threads } : {}),
  };
  const parsed = optimizeRequestSchema.safeParse(candidate);
  if (!parsed.success) throw unprocessable("the mark's stored data does not make a valid search", zodIssues(parsed.error));
  return parsed.data;
}
