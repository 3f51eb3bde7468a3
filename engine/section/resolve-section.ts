/**
 * Turn a user section (contract `section`) into a {@link ResolvedSection}: bar
 * coordinates from a layout, table look-ups, and gross/steel properties, so the
 * strength loops do no look-ups.
 */
import { ES, assertLongitudinalFy, beta1, concreteModulus } from "../materials";
import { barProperties, isBarSize, tieSizeFor } from "../rebar";
import type { BarSize, ResolvedBar, ResolvedSection, SectionInput } from "../types";

/** Geometric tolerance for "bar inside the section", in. */
const GEOMETRY_TOL = 1e-9;

function requirePositive(value: unknown, field: string): number {
  if (typeof value !== "number" || !Number.isFinite(value) || value <= 0) {
    throw new RangeError(`section.${field} must be a positive finite number (got ${String(value)})`);
  }
  return value;
}

function requireInteger(value: unknown, field: string, min: number): number {
  if (typeof value !== "number" || !Number.isInteger(value) || value < min) {
    throw new RangeError(`section.${field} must be an integer ≥ ${min} (got ${String(value)})`);
  }
  return value;
}

function requireBarSize(value: unknown, field: string): BarSize {
  if (!isBarSize(value)) {
    throw new RangeError(`section.${field}: unknown bar size ${JSON.stringify(value)} (expected #3…#18 or metric 10…57)`);
  }
  return value;
}

/** Evenly spaced values from lo to hi inclusive (a single value at the middle when n = 1). */
function spread(lo: number, hi: number, n: number): number[] {
  if (n === 1) return [(lo + hi) / 2];
  const out: number[] = [];
  for (let i = 0; i < n; i++) out.push(lo + ((hi - lo) * i) / (n - 1));
  return out;
}

/**
 * Resolve a section: shape and material checks, bars (explicit or from a layout),
 * ties, and the precomputed properties used by every strength calculation.
 *
 * Layouts (bar centres at cover + tie diameter + db/2 from the faces):
 * - `perimeter` nb × nh: nb bars on each face of width b (y = ±(h/2 − edge)), nh on each
 *   face of width h (x = ±(b/2 − edge)), corners shared: 2 nb + 2 (nh − 2) bars, listed
 *   listed top face left → right, right face downward, bottom face right → left, left face upward.
 * - `faces` n: n bars on each of the two faces normal to h (y = ±(h/2 − edge)).
 * - `circle` n: on a circle of radius D/2 − edge, the first bar on +y, then clockwise
 *   (toward +x) at 2π/n.
 *
 * Ties when `section.tie` is absent: size per 25.7.2.2 for the largest bar; spacing the
 * largest 25.7.2.1 allows, min(16 db of the smallest bar, 48 dtie, least dimension),
 * rounded down to a whole inch. A spiral on a circular section instead takes the largest
 * pitch satisfying ρs ≥ 0.45 (Ag/Ach − 1) f'c/fyt (25.7.3.3, fyt taken = fy) and a clear
 * pitch ≤ 3 in (25.7.3.1), rounded down to 1/4 in.
 *
 * Properties: Ag, Ast, ρ, gross Ig and steel Ise about the centroidal axes, Ec
 * (19.2.2.1(b)), Es (20.2.2.2), β1 (Table 22.2.2.4.3), P0 = 0.85 f'c (Ag − Ast) + fy Ast
 * (22.4.2.2), Pn,max = 0.80 P0 tied / 0.85 P0 spiral (Table 22.4.2.1), φPn,max with
 * φ = 0.65 / 0.75 (Table 21.2.2), Pnt = fy Ast (22.4.3.1). Units: in, in², in⁴, ksi, kip.
 *
 * Detailing limits (bar count, spacing, ρ limits) are not enforced here: they are data
 * for the detailing checks. Geometry that cannot exist is an error.
 *
 * @throws RangeError naming the field: non-positive/NaN dimensions, missing b/h/D, fc ≤ 0,
 *   fy ≤ 0 or > 80 ksi, unknown bar size, no bars, a bar circle outside the section, a
 *   layout that does not fit inside the cover.
 * @throws TypeError for an unknown shape or confinement.
 * @example
 * resolveSection({ shape: "rect", b: 18, h: 22, fc: 5, fy: 60, confinement: "tied",
 *   cover: 1.5, layout: { type: "perimeter", size: "#8", nb: 3, nh: 3 } }).Ast // 6.32
 */
export function resolveSection(input: SectionInput): ResolvedSection {
  if (input === null || typeof input !== "object") throw new TypeError("section must be an object");
  const shape = input.shape;
  if (shape !== "rect" && shape !== "circle") {
    throw new TypeError(`section.shape must be "rect" or "circle" (got ${JSON.stringify(shape)})`);
  }
  const confinement = input.confinement;
  if (confinement !== "tied" && confinement !== "spiral") {
    throw new TypeError(`section.confinement must be "tied" or "spiral" (got ${JSON.stringify(confinement)})`);
  }
  let b: number;
  let h: number;
  let D = 0;
  if (shape === "rect") {
    if (input.b === undefined) throw new RangeError("section.b is required for a rectangular section");
    if (input.h === undefined) throw new RangeError("section.h is required for a rectangular section");
    b = requirePositive(input.b, "b");
    h = requirePositive(input.h, "h");
  } else {
    if (input.D === undefined) throw new RangeError("section.D is required for a circular section");
    D = requirePositive(input.D, "D");
    b = D;
    h = D;
  }
  const fc = requirePositive(input.fc, "fc");
  assertLongitudinalFy(typeof input.fy === "number" ? input.fy : Number.NaN, "section.fy");
  const fy = input.fy;
  const cover = input.cover;
  if (typeof cover !== "number" || !Number.isFinite(cover) || cover < 0) {
    throw new RangeError(`section.cover must be a finite number ≥ 0 (got ${String(cover)})`);
  }
  if (input.bars !== undefined && input.layout !== undefined) {
    throw new RangeError("section: give either bars or layout, not both");
  }

  // Longitudinal bar sizes first: the tie size depends on the largest bar.
  let sizes: BarSize[];
  if (input.bars !== undefined) {
    if (!Array.isArray(input.bars) || input.bars.length < 1) {
      throw new RangeError("section.bars must hold at least 1 bar");
    }
    sizes = input.bars.map((bar, i) => requireBarSize(bar?.size, `bars.${i}.size`));
  } else if (input.layout !== undefined) {
    sizes = [requireBarSize(input.layout.size, "layout.size")];
  } else {
    throw new RangeError("section needs bars or a layout (at least 1 bar)");
  }
  let largest = sizes[0] as BarSize;
  let dbLargest = barProperties(largest).db;
  let dbSmallest = dbLargest;
  for (const s of sizes) {
    const db = barProperties(s).db;
    if (db > dbLargest) {
      largest = s;
      dbLargest = db;
    }
    if (db < dbSmallest) dbSmallest = db;
  }

  const given = input.tie !== undefined;
  const tieSize = given ? requireBarSize(input.tie?.size, "tie.size") : tieSizeFor(largest);
  const dTie = barProperties(tieSize).db;

  const bars: ResolvedBar[] = [];
  let lastSize: BarSize | null = null;
  let lastArea = 0;
  let lastDb = 0;
  const pushBar = (x: number, y: number, size: BarSize): void => {
    if (size !== lastSize) {
      const p = barProperties(size);
      lastSize = size;
      lastArea = p.area;
      lastDb = p.db;
    }
    bars.push({ x, y, size, area: lastArea, db: lastDb });
  };

  if (input.bars !== undefined) {
    input.bars.forEach((bar, i) => {
      if (typeof bar.x !== "number" || !Number.isFinite(bar.x)) {
        throw new RangeError(`section.bars.${i}.x must be a finite number (got ${String(bar.x)})`);
      }
      if (typeof bar.y !== "number" || !Number.isFinite(bar.y)) {
        throw new RangeError(`section.bars.${i}.y must be a finite number (got ${String(bar.y)})`);
      }
      pushBar(bar.x, bar.y, bar.size);
    });
  } else if (input.layout !== undefined) {
    const layout = input.layout;
    const size = sizes[0] as BarSize;
    const edge = cover + dTie + barProperties(size).db / 2;
    const type = (layout as { type?: unknown }).type;
    if (type === "perimeter" || type === "faces") {
      if (shape !== "rect") throw new RangeError(`section.layout.type "${type}" needs a rectangular section`);
      const xe = b / 2 - edge;
      const ye = h / 2 - edge;
      if (xe < 0) throw new RangeError(`section.b = ${b} in is too small for cover + tie + bar (${2 * edge} in)`);
      if (ye < 0) throw new RangeError(`section.h = ${h} in is too small for cover + tie + bar (${2 * edge} in)`);
      if (layout.type === "perimeter") {
        const nb = requireInteger(layout.nb, "layout.nb", 2);
        const nh = requireInteger(layout.nh, "layout.nh", 2);
        const xs = spread(-xe, xe, nb);
        const ys = spread(-ye, ye, nh);
        for (const x of xs) pushBar(x, ye, size); // top face, left → right
        for (let j = nh - 2; j >= 1; j--) pushBar(xe, ys[j] as number, size); // right face, down
        for (let i = nb - 1; i >= 0; i--) pushBar(xs[i] as number, -ye, size); // bottom, right → left
        for (let j = 1; j <= nh - 2; j++) pushBar(-xe, ys[j] as number, size); // left face, up
      } else if (layout.type === "faces") {
        const n = requireInteger(layout.n, "layout.n", 1);
        const xs = spread(-xe, xe, n);
        for (const x of xs) pushBar(x, ye, size);
        for (let i = n - 1; i >= 0; i--) pushBar(xs[i] as number, -ye, size);
      }
    } else if (type === "circle") {
      if (shape !== "circle") throw new RangeError('section.layout.type "circle" needs a circular section');
      const n = requireInteger((layout as { n?: unknown }).n, "layout.n", 1);
      const R = D / 2 - edge;
      if (R < 0) throw new RangeError(`section.D = ${D} in is too small for cover + tie + bar (${2 * edge} in)`);
      for (let i = 0; i < n; i++) {
        const t = (2 * Math.PI * i) / n;
        pushBar(R * Math.sin(t), R * Math.cos(t), size);
      }
    } else {
      throw new RangeError(`section.layout.type must be "perimeter", "faces" or "circle" (got ${JSON.stringify(type)})`);
    }
  }

  // Every bar circle must lie inside the concrete outline.
  bars.forEach((bar, i) => {
    const r = bar.db / 2;
    const outside =
      shape === "rect"
        ? Math.abs(bar.x) + r > b / 2 + GEOMETRY_TOL || Math.abs(bar.y) + r > h / 2 + GEOMETRY_TOL
        : Math.hypot(bar.x, bar.y) + r > D / 2 + GEOMETRY_TOL;
    if (outside) {
      throw new RangeError(
        `section.bars.${i} (${bar.size} at x = ${bar.x}, y = ${bar.y}) lies outside the ${shape === "rect" ? `${b} × ${h} in` : `${D} in diameter`} section`,
      );
    }
  });

  const Ag = shape === "rect" ? b * h : (Math.PI * D * D) / 4;
  const Igx = shape === "rect" ? (b * h * h * h) / 12 : (Math.PI * D ** 4) / 64;
  const Igy = shape === "rect" ? (h * b * b * b) / 12 : Igx;
  let Ast = 0;
  let Isex = 0;
  let Isey = 0;
  for (const bar of bars) {
    Ast += bar.area;
    Isex += bar.area * bar.y * bar.y;
    Isey += bar.area * bar.x * bar.x;
  }
  if (Ast >= Ag) throw new RangeError(`section: steel area ${Ast} in² is not less than the gross area ${Ag} in²`);

  let spacing: number;
  if (given) {
    spacing = requirePositive(input.tie?.spacing, "tie.spacing");
  } else if (confinement === "spiral" && shape === "circle") {
    spacing = deriveSpiralPitch(D, cover, dTie, barProperties(tieSize).area, fc, fy);
  } else {
    // 25.7.2.1: 16 db (smallest longitudinal bar, §7.10), 48 dtie, least dimension
    const sMax = Math.min(16 * dbSmallest, 48 * dTie, Math.min(b, h));
    spacing = Math.floor(sMax + 1e-9);
  }

  const P0 = 0.85 * fc * (Ag - Ast) + fy * Ast;
  const PnMax = (confinement === "spiral" ? 0.85 : 0.8) * P0;
  const phiC = confinement === "spiral" ? 0.75 : 0.65;
  return {
    shape,
    b,
    h,
    D,
    fc,
    fy,
    confinement,
    cover,
    tie: { size: tieSize, db: dTie, spacing, given },
    bars,
    Ag,
    Ast,
    rho: Ast / Ag,
    Igx,
    Igy,
    Isex,
    Isey,
    Ec: concreteModulus(fc),
    Es: ES,
    beta1: beta1(fc),
    P0,
    PnMax,
    phiPnMax: phiC * PnMax,
    Pnt: fy * Ast,
  };
}

/**
 * Largest spiral pitch (centre to centre, in) meeting ρs ≥ 0.45 (Ag/Ach − 1) f'c/fyt
 * (25.7.3.3) with ρs = 4 Asp / (Dch s) (R25.7.3, from memory) and clear pitch ≤ 3 in
 * (25.7.3.1), rounded down to 1/4 in. fyt is taken equal to fy.
 */
function deriveSpiralPitch(D: number, cover: number, dsp: number, asp: number, fc: number, fyt: number): number {
  const Dch = D - 2 * cover;
  const Ag = (Math.PI * D * D) / 4;
  const Ach = (Math.PI * Dch * Dch) / 4;
  const rhoMin = 0.45 * (Ag / Ach - 1) * (fc / fyt);
  const sRho = rhoMin > 0 ? (4 * asp) / (Dch * rhoMin) : Number.POSITIVE_INFINITY;
  const s = Math.min(sRho, 3 + dsp);
  return Math.max(0.25, Math.floor(s * 4 + 1e-9) / 4);
}
