/**
 * Client-side shapes of searches, their stored candidates and adopted alternatives, as the routes
 * return them (US units: in, ksi; cost in $, carbon in kgCO2e, per column).
 */
import type { BarSize } from "@/engine/types";
import type { ProjectRecord, PriceBookRecord } from "@/components/projects/use-project";
import type { MarkRecord, LoadRecord } from "@/components/marks/mark-types";
import { roleAllows, ROLES, type Permission, type Role } from "@/lib/permissions";

export type SearchStatus = "queued" | "running" | "done" | "failed" | "cancelled";

export interface SearchStats {
  candidates?: number;
  fullChecks?: number;
  passing?: number;
  ms?: number;
  threads?: number;
  /** id of the cheapest passing candidate */
  best?: string | null;
  /** ids of the carbon-versus-cost front */
  carbonFront?: string[];
  /** why whole regions have no passing candidate */
  rejected?: Array<{ region: string; reason: string }>;
  assumptions?: {
    code?: string;
    ei?: string;
    braced?: boolean;
    kx?: number;
    ky?: number;
    rhoMax?: number;
    exposure?: string;
    caution?: string;
    notes?: string[];
  };
}

export interface SearchView {
  id: string;
  markId: string;
  status: SearchStatus;
  progress: number;
  kept: number;
  stats: SearchStats | null;
  error: string | null;
  attempt: number;
  priceBookId: string | null;
  stale: boolean;
  createdAt: string;
  startedAt: string | null;
  finishedAt: string | null;
  version: number;
}

export interface CandidateBars {
  size: BarSize;
  count: number;
  layout: { type: "perimeter"; nb: number; nh: number } | { type: "circle"; n: number } | { type: string; [k: string]: unknown };
}

/** One stored passing candidate; front entries also carry the cost breakdown and quantities. */
export interface CandidateRow {
  id: string;
  shape: "rect" | "circle";
  b?: number;
  h?: number;
  D?: number;
  fc?: number;
  fy?: number;
  confinement?: "tied" | "spiral";
  bars?: CandidateBars;
  braceLevels?: number;
  cost: number;
  carbon: number;
  utilization: number;
  governing?: string;
  rho?: number;
  costBreakdown?: { concrete: number; steel: number; formwork: number; bracing: number };
  quantities?: { concreteYd3: number; steelLb: number; formFt2: number };
  onFront: boolean;
}

export interface CandidatesResponse {
  status: SearchStatus;
  candidates: CandidateRow[];
}

export type AlternativeStatus = "proposed" | "approved" | "rejected" | "superseded";

export interface AlternativeView {
  id: string;
  markId: string;
  searchId: string | null;
  candidateId: string;
  candidate: Partial<CandidateRow> | null;
  status: AlternativeStatus;
  comment: string;
  proposedBy: string | null;
  decidedBy: string | null;
  decidedAt: string | null;
  priceBookId: string | null;
  stale: boolean;
  createdAt: string;
  version: number;
}

export interface MarkResponse {
  mark: MarkRecord;
  loads: LoadRecord[];
  project: ProjectRecord;
  role: string;
  can: { editMarks: boolean; editLoads: boolean };
}

export type { PriceBookRecord };

/** Whether the signed-in person's role allows a step (the server enforces it; the UI hides what it refuses). */
export function roleCan(role: string | undefined, permission: Permission): boolean {
  return role !== undefined && (ROLES as readonly string[]).includes(role) && roleAllows(role as Role, permission);
}

export const ACTIVE_STATUSES: readonly SearchStatus[] = ["queued", "running"];

export function isActive(status: SearchStatus): boolean {
  return ACTIVE_STATUSES.includes(status);
}

/** Words of our own for each search status. */
export const STATUS_WORDS: Record<SearchStatus, string> = {
  queued: "waiting for a worker",
  running: "searching",
  done: "finished",
  failed: "failed",
  cancelled: "cancelled",
};
