/**
 * SI ⇄ US customary conversion, used only at the edges (request in, response out).
 * The engine itself works in kip, in, ksi, kip-in, kip-in² (column-checks.md, scope).
 * SI units: kN, mm, MPa, kN·m, kN·m²; quantities m³, kg, m²; prices per m³, kg, m².
 */
import type {
  AxisResult,
  BiaxialResult,
  CarbonFactors,
  CaseResult,
  CheckInput,
  CheckOutput,
  DetailingResult,
  DiagramResult,
  EndMoments,
  LoadCase,
  MemberInput,
  Prices,
  SectionInput,
  SwayAxisData,
} from "./types";

export type UnitSystem = "US" | "SI";

/** 1 kip in kN (exact: 4.4482216152605 N/lbf × 1000). */
export const KN_PER_KIP = 4.4482216152605;
/** 1 in in mm (exact). */
export const MM_PER_IN = 25.4;
/** 1 ksi in MPa. */
export const MPA_PER_KSI = KN_PER_KIP / (MM_PER_IN * MM_PER_IN) * 1000;
/** 1 kip-in in kN·m. */
export const KNM_PER_KIPIN = KN_PER_KIP * MM_PER_IN / 1000;
/** 1 kip-in² in kN·m². */
export const KNM2_PER_KIPIN2 = KN_PER_KIP * (MM_PER_IN / 1000) ** 2;
/** 1 yd³ in m³ (exact: 0.9144³). */
export const M3_PER_YD3 = 0.9144 ** 3;
/** 1 lb in kg (exact). */
export const KG_PER_LB = 0.45359237;
/** 1 ft² in m² (exact: 0.3048²). */
export const M2_PER_FT2 = 0.3048 ** 2;

/**
 * Convert a force. kip → kN when `to` is "SI", kN → kip when "US".
 * @example convertForce(100, "SI") // 444.822 kN
 */
export function convertForce(value: number, to: UnitSystem): number {
  return to === "SI" ? value * KN_PER_KIP : value / KN_PER_KIP;
}
/** Convert a length: in → mm ("SI") or mm → in ("US"). @example convertLength(1, "SI") // 25.4 */
export function convertLength(value: number, to: UnitSystem): number {
  return to === "SI" ? value * MM_PER_IN : value / MM_PER_IN;
}
/** Convert a stress: ksi → MPa ("SI") or MPa → ksi ("US"). @example convertStress(60, "SI") // 413.69 */
export function convertStress(value: number, to: UnitSystem): number {
  return to === "SI" ? value * MPA_PER_KSI : value / MPA_PER_KSI;
}
/** Convert a moment: kip-in → kN·m ("SI") or kN·m → kip-in ("US"). @example convertMoment(1000, "SI") // 112.98 */
export function convertMoment(value: number, to: UnitSystem): number {
  return to === "SI" ? value * KNM_PER_KIPIN : value / KNM_PER_KIPIN;
}
/** Convert a flexural stiffness: kip-in² → kN·m² ("SI") or back ("US"). @example convertStiffness(1e7, "SI") // 28 699 kN·m² */
export function convertStiffness(value: number, to: UnitSystem): number {
  return to === "SI" ? value * KNM2_PER_KIPIN2 : value / KNM2_PER_KIPIN2;
}

function convertNullable(value: number | null, f: (v: number, to: UnitSystem) => number, to: UnitSystem): number | null {
  return value === null ? null : f(value, to);
}

function convertEndMoments(m: EndMoments, to: UnitSystem): EndMoments {
  const out: EndMoments = { M1: convertMoment(m.M1, to), M2: convertMoment(m.M2, to), curvature: m.curvature };
  if (m.M1s !== undefined) out.M1s = convertMoment(m.M1s, to);
  if (m.M2s !== undefined) out.M2s = convertMoment(m.M2s, to);
  return out;
}

/**
 * Convert a section as given (dimensions, strengths, bar coordinates, tie spacing).
 * Bar designations are not converted: US and A615M sizes are both understood by the engine.
 * @example convertSectionInput(siSection, "US").b // 457.2 mm → 18 in
 */
export function convertSectionInput(s: SectionInput, to: UnitSystem): SectionInput {
  const L = (v: number) => convertLength(v, to);
  const out: SectionInput = {
    ...s,
    fc: convertStress(s.fc, to),
    fy: convertStress(s.fy, to),
    cover: L(s.cover),
  };
  if (s.b !== undefined) out.b = L(s.b);
  if (s.h !== undefined) out.h = L(s.h);
  if (s.D !== undefined) out.D = L(s.D);
  if (s.bars !== undefined) out.bars = s.bars.map((bar) => ({ ...bar, x: L(bar.x), y: L(bar.y) }));
  if (s.tie !== undefined) out.tie = { size: s.tie.size, spacing: L(s.tie.spacing) };
  return out;
}

function convertSway(d: SwayAxisData, to: UnitSystem): SwayAxisData {
  return "Q" in d ? { Q: d.Q } : { sumPu: convertForce(d.sumPu, to), sumPc: convertForce(d.sumPc, to) };
}

/** Convert member data (lengths; sway ΣPu, ΣPc). @example convertMemberInput({ lu: 5181.6, kx: 1, ky: 1, braced: true }, "US").lu // 204 */
export function convertMemberInput(m: MemberInput, to: UnitSystem): MemberInput {
  const out: MemberInput = { ...m, lu: convertLength(m.lu, to) };
  if (m.lux !== undefined) out.lux = convertLength(m.lux, to);
  if (m.luy !== undefined) out.luy = convertLength(m.luy, to);
  if (m.pourHeight !== undefined) out.pourHeight = convertLength(m.pourHeight, to);
  if (m.sway !== undefined) {
    const sway: NonNullable<MemberInput["sway"]> = {};
    if (m.sway.x !== undefined) sway.x = convertSway(m.sway.x, to);
    if (m.sway.y !== undefined) sway.y = convertSway(m.sway.y, to);
    out.sway = sway;
  }
  return out;
}

/** Convert a load case (Pu kN ⇄ kip, end moments kN·m ⇄ kip-in). @example convertLoadCase(load, "SI") */
export function convertLoadCase(l: LoadCase, to: UnitSystem): LoadCase {
  const out: LoadCase = { ...l, Pu: convertForce(l.Pu, to), Mx: convertEndMoments(l.Mx, to) };
  if (l.My !== undefined) out.My = convertEndMoments(l.My, to);
  return out;
}

function mapKeys(rec: Record<string, number>, keyTo: UnitSystem, f: (v: number) => number): Record<string, number> {
  const out: Record<string, number> = {};
  for (const [k, v] of Object.entries(rec)) {
    // keys are f'c values; keep them readable after conversion
    const key = String(Number(convertStress(Number(k), keyTo).toPrecision(6)));
    out[key] = f(v);
  }
  return out;
}

/**
 * Convert a price book. SI prices are per m³ (concrete, keyed by f'c in MPa), per kg
 * (steel) and per m² (forms); US per yd³ (keyed by f'c in ksi), lb and ft².
 * @example convertPrices(siPrices, "US").concrete["5"]
 */
export function convertPrices(p: Prices, to: UnitSystem): Prices {
  // a price per unit converts inversely to the unit itself
  const perVolume = (v: number) => (to === "SI" ? v / M3_PER_YD3 : v * M3_PER_YD3);
  const perMass = (v: number) => (to === "SI" ? v / KG_PER_LB : v * KG_PER_LB);
  const perArea = (v: number) => (to === "SI" ? v / M2_PER_FT2 : v * M2_PER_FT2);
  return {
    concrete: mapKeys(p.concrete, to, perVolume),
    steel: perMass(p.steel),
    formwork: perArea(p.formwork),
    roundFormwork: perArea(p.roundFormwork),
    brace: p.brace,
  };
}

/** Convert carbon factors: kgCO2e per m³ / kg (SI) or per yd³ / lb (US). @example convertCarbon(c, "US").steel */
export function convertCarbon(c: CarbonFactors, to: UnitSystem): CarbonFactors {
  const perVolume = (v: number) => (to === "SI" ? v / M3_PER_YD3 : v * M3_PER_YD3);
  const perMass = (v: number) => (to === "SI" ? v / KG_PER_LB : v * KG_PER_LB);
  return { concrete: mapKeys(c.concrete, to, perVolume), steel: perMass(c.steel) };
}

/**
 * Convert a whole check request from SI to the engine's US units (or back).
 * @example convertCheckInput(siRequest, "US")
 */
export function convertCheckInput(input: CheckInput, to: UnitSystem): CheckInput {
  const out: CheckInput = {
    section: convertSectionInput(input.section, to),
    member: convertMemberInput(input.member, to),
    loads: input.loads.map((l) => convertLoadCase(l, to)),
  };
  if (input.options !== undefined) {
    out.options = { ...input.options };
    if (input.options.dagg !== undefined) out.options.dagg = convertLength(input.options.dagg, to);
  }
  if (input.prices !== undefined) out.prices = convertPrices(input.prices, to);
  if (input.carbon !== undefined) out.carbon = convertCarbon(input.carbon, to);
  return out;
}

function convertAxisResult(a: AxisResult, to: UnitSystem): AxisResult {
  return {
    ...a,
    EI: convertNullable(a.EI, convertStiffness, to),
    Pc: convertNullable(a.Pc, convertForce, to),
    M2: convertMoment(a.M2, to),
    Mc: convertMoment(a.Mc, to),
    phiMn: convertMoment(a.phiMn, to),
  };
}

function convertBiaxial(b: BiaxialResult | null, to: UnitSystem): BiaxialResult | null {
  if (b === null) return null;
  const out: BiaxialResult = {
    ...b,
    Mcx: convertMoment(b.Mcx, to),
    Mcy: convertMoment(b.Mcy, to),
    phiMn: convertMoment(b.phiMn, to),
  };
  if (b.bresler !== undefined) out.bresler = convertNullable(b.bresler, convertForce, to);
  return out;
}

function convertDetailing(d: DetailingResult, to: UnitSystem): DetailingResult {
  const from = to === "SI" ? "in" : "mm";
  if (d.unit !== from) return d;
  return { ...d, value: convertLength(d.value, to), limit: convertLength(d.limit, to), unit: to === "SI" ? "mm" : "in" };
}

function convertCase(c: CaseResult, to: UnitSystem): CaseResult {
  return {
    ...c,
    Pu: convertForce(c.Pu, to),
    x: convertAxisResult(c.x, to),
    y: convertAxisResult(c.y, to),
    biaxial: convertBiaxial(c.biaxial, to),
  };
}

/**
 * Convert a check result from the engine's US units to SI (or back). Quantities become
 * m³ of concrete, kg of steel and m² of forms under the same field names; cost totals are
 * currency and stay; carbon stays kgCO2e.
 * @example convertCheckOutput(checkMember(usInput), "SI").cases[0].x.Mc // kN·m
 */
export function convertCheckOutput(o: CheckOutput, to: UnitSystem): CheckOutput {
  const vol = (v: number) => (to === "SI" ? v * M3_PER_YD3 : v / M3_PER_YD3);
  const mass = (v: number) => (to === "SI" ? v * KG_PER_LB : v / KG_PER_LB);
  const area = (v: number) => (to === "SI" ? v * M2_PER_FT2 : v / M2_PER_FT2);
  const out: CheckOutput = {
    ...o,
    section: {
      ...o.section,
      Ag: o.section.Ag * (to === "SI" ? MM_PER_IN ** 2 : 1 / MM_PER_IN ** 2),
      Ast: o.section.Ast * (to === "SI" ? MM_PER_IN ** 2 : 1 / MM_PER_IN ** 2),
      P0: convertForce(o.section.P0, to),
      phiPnMax: convertForce(o.section.phiPnMax, to),
      bars: o.section.bars.map((b) => ({
        ...b,
        x: convertLength(b.x, to),
        y: convertLength(b.y, to),
        area: b.area * (to === "SI" ? MM_PER_IN ** 2 : 1 / MM_PER_IN ** 2),
        db: convertLength(b.db, to),
      })),
      detailing: o.section.detailing.map((d) => convertDetailing(d, to)),
    },
    cases: o.cases.map((c) => convertCase(c, to)),
    quantities: {
      ...o.quantities,
      concreteYd3: vol(o.quantities.concreteYd3),
      steelLb: mass(o.quantities.steelLb),
      formFt2: area(o.quantities.formFt2),
    },
    assumptions: {
      ...o.assumptions,
      units: to,
      notes: [
        ...(o.assumptions.notes ?? []),
        ...(to === "SI"
          ? ["SI output: quantities.concreteYd3 is in m³, steelLb in kg and formFt2 in m² (field names kept from the contract); detailing lengths in mm"]
          : []),
      ],
    },
  };
  if (o.cost !== undefined) {
    out.cost = {
      ...o.cost,
      lines: o.cost.lines.map((l) => {
        const f = l.unit === "yd3" ? vol : l.unit === "lb" ? mass : l.unit === "ft2" ? area : (v: number) => v;
        const unit = to === "SI" ? ({ yd3: "m3", lb: "kg", ft2: "m2" } as Record<string, string>)[l.unit] ?? l.unit : l.unit;
        const quantity = f(l.quantity);
        return { ...l, quantity, unit, unitPrice: quantity === 0 ? l.unitPrice : l.amount / quantity };
      }),
    };
  }
  return out;
}

/** Convert an interaction diagram: c in mm, forces kN, moments kN·m. @example convertDiagram(d, "SI").P0 */
export function convertDiagram(d: DiagramResult, to: UnitSystem): DiagramResult {
  return {
    P0: convertForce(d.P0, to),
    phiPnMax: convertForce(d.phiPnMax, to),
    points: d.points.map((p) => ({
      c: convertLength(p.c, to),
      Pn: convertForce(p.Pn, to),
      Mn: convertMoment(p.Mn, to),
      phi: p.phi,
      phiPn: convertForce(p.phiPn, to),
      phiMn: convertMoment(p.phiMn, to),
      epsT: p.epsT,
    })),
  };
}
