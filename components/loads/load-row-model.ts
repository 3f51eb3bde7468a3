/**
 * The loads table's row model: cells as typed (display units), parsed into a contract load case
 * (US units) and validated with the shared schema, with each issue placed on its cell.
 */
import { loadCaseSchema, swayPartIssues } from "@/lib/validation/load-combination";
import type { LoadCase } from "@/engine/types";
import { fromDisplay, inputValue, type Quantity, type UnitSystem } from "@/components/projects/units";
import type { LoadRecord } from "@/components/marks/mark-types";

export const LOAD_COLUMNS = [
  { key: "name", label: "Combination", quantity: "none" as Quantity, kind: "text" },
  { key: "Pu", label: "Pu", quantity: "force" as Quantity, kind: "number" },
  { key: "Mx.M1", label: "Mx M1", quantity: "moment" as Quantity, kind: "number" },
  { key: "Mx.M2", label: "Mx M2", quantity: "moment" as Quantity, kind: "number" },
  { key: "Mx.curvature", label: "x curvature", quantity: "none" as Quantity, kind: "curvature" },
  { key: "My.M1", label: "My M1", quantity: "moment" as Quantity, kind: "number" },
  { key: "My.M2", label: "My M2", quantity: "moment" as Quantity, kind: "number" },
  { key: "My.curvature", label: "y curvature", quantity: "none" as Quantity, kind: "curvature" },
  { key: "betaDns", label: "βdns", quantity: "none" as Quantity, kind: "number" },
  { key: "Mx.M1s", label: "Mx M1s", quantity: "moment" as Quantity, kind: "number", sway: true },
  { key: "Mx.M2s", label: "Mx M2s", quantity: "moment" as Quantity, kind: "number", sway: true },
  { key: "My.M1s", label: "My M1s", quantity: "moment" as Quantity, kind: "number", sway: true },
  { key: "My.M2s", label: "My M2s", quantity: "moment" as Quantity, kind: "number", sway: true },
] as const;

export type LoadColumnKey = (typeof LOAD_COLUMNS)[number]["key"];
export type Cells = Record<LoadColumnKey, string>;

export const EMPTY_CELLS: Cells = {
  name: "",
  Pu: "",
  "Mx.M1": "",
  "Mx.M2": "",
  "Mx.curvature": "single",
  "My.M1": "",
  "My.M2": "",
  "My.curvature": "double",
  betaDns: "0",
  "Mx.M1s": "",
  "Mx.M2s": "",
  "My.M1s": "",
  "My.M2s": "",
};

export function cellsOf(load: LoadRecord, units: UnitSystem): Cells {
  const m = (v: number | undefined) => inputValue(v, "moment", units);
  return {
    name: load.name,
    Pu: inputValue(load.Pu, "force", units),
    "Mx.M1": m(load.Mx.M1),
    "Mx.M2": m(load.Mx.M2),
    "Mx.curvature": load.Mx.curvature,
    "My.M1": m(load.My?.M1),
    "My.M2": m(load.My?.M2),
    "My.curvature": load.My?.curvature ?? "double",
    betaDns: String(load.betaDns),
    "Mx.M1s": m(load.Mx.M1s),
    "Mx.M2s": m(load.Mx.M2s),
    "My.M1s": m(load.My?.M1s),
    "My.M2s": m(load.My?.M2s),
  };
}

export function isBlank(cells: Cells): boolean {
  return LOAD_COLUMNS.every((c) => c.kind === "curvature" || c.key === "betaDns" || cells[c.key].trim() === "");
}

/** Parse and validate a row; errors keyed by column. */
export function parseRow(cells: Cells, units: UnitSystem, braced: boolean): { load: LoadCase | null; errors: Partial<Record<LoadColumnKey, string>> } {
  const errors: Partial<Record<LoadColumnKey, string>> = {};
  const num = (key: LoadColumnKey, q: Quantity, required: boolean): number | undefined => {
    const raw = cells[key].trim();
    if (raw === "") {
      if (required) errors[key] = "needed";
      return undefined;
    }
    const v = Number(raw);
    if (!Number.isFinite(v)) {
      errors[key] = `"${raw}" is not a number`;
      return undefined;
    }
    return fromDisplay(v, q, units);
  };
  const Pu = num("Pu", "force", true);
  const x = { M1: num("Mx.M1", "moment", false) ?? 0, M2: num("Mx.M2", "moment", true) ?? 0, curvature: cells["Mx.curvature"] as "single" | "double" };
  const xs = { M1s: num("Mx.M1s", "moment", false), M2s: num("Mx.M2s", "moment", false) };
  const yM1 = num("My.M1", "moment", false);
  const yM2 = num("My.M2", "moment", false);
  const ys = { M1s: num("My.M1s", "moment", false), M2s: num("My.M2s", "moment", false) };
  const betaDns = num("betaDns", "none", false) ?? 0;
  const hasY = yM1 !== undefined || yM2 !== undefined || ys.M1s !== undefined || ys.M2s !== undefined;
  const candidate: LoadCase = {
    name: cells.name.trim(),
    Pu: Pu ?? 0,
    betaDns,
    Mx: { ...x, ...(xs.M1s !== undefined ? { M1s: xs.M1s } : {}), ...(xs.M2s !== undefined ? { M2s: xs.M2s } : {}) },
    ...(hasY
      ? {
          My: {
            M1: yM1 ?? 0,
            M2: yM2 ?? 0,
            curvature: cells["My.curvature"] as "single" | "double",
            ...(ys.M1s !== undefined ? { M1s: ys.M1s } : {}),
            ...(ys.M2s !== undefined ? { M2s: ys.M2s } : {}),
          },
        }
      : {}),
  };
  const result = loadCaseSchema.safeParse(candidate);
  if (!result.success) {
    for (const issue of result.error.issues) {
      const key = issue.path.map(String).join(".") as LoadColumnKey;
      const col = LOAD_COLUMNS.some((c) => c.key === key) ? key : key === ("Mx" as LoadColumnKey) ? "Mx.M2" : "name";
      if (errors[col] === undefined) errors[col] = issue.message;
    }
  } else {
    for (const issue of swayPartIssues(result.data, braced)) errors[issue.path as LoadColumnKey] = issue.message;
  }
  return { load: Object.keys(errors).length === 0 && result.success ? result.data : null, errors };
}
