/**
 * A column section drawn to scale in SVG: the concrete outline, the tie or spiral at the clear
 * cover, each longitudinal bar at its true diameter and position, the bending axes, and
 * dimension lines with units. Works for any bar arrangement (explicit coordinates).
 * Coordinates are in inches with the origin at the centroid, +y up (Mx compresses the +y face).
 */
import { formatQuantity, type UnitSystem } from "@/components/projects/units";

export interface SketchBar {
  /** bar centre, in */
  x: number;
  y: number;
  /** bar diameter, in */
  db: number;
  size: string;
}

export interface SectionSketchProps {
  shape: "rect" | "circle";
  /** width (along x), in */
  b?: number;
  /** depth (along y), in */
  h?: number;
  /** diameter, in */
  D?: number;
  /** clear cover to the tie or spiral, in */
  cover: number;
  bars: SketchBar[];
  /** tie or spiral bar diameter, in (0.375 in, a #3, when not known) */
  tieDb?: number;
  confinement?: "tied" | "spiral";
  units?: UnitSystem;
  /** accessible name, e.g. "Section of C-3" */
  title?: string;
  /** drawn width in CSS pixels (the height follows the section's proportions) */
  width?: number;
}

export function SectionSketch({ shape, b, h, D, cover, bars, tieDb = 0.375, confinement = "tied", units = "US", title = "Column section", width = 320 }: SectionSketchProps) {
  const W = shape === "circle" ? (D ?? 0) : (b ?? 0);
  const H = shape === "circle" ? (D ?? 0) : (h ?? 0);
  if (!(W > 0) || !(H > 0)) return <p className="text-sm text-ink-500">No section to draw.</p>;
  const size = Math.max(W, H);
  const pad = size * 0.28;
  const font = size * 0.055;
  const stroke = size * 0.006;
  const viewBox = `${-W / 2 - pad} ${-H / 2 - pad * 0.6} ${W + pad * 1.6} ${H + pad * 1.6}`;
  const heightPx = (width * (H + pad * 1.6)) / (W + pad * 1.6);
  // Tie centreline sits at cover + dtie/2 from the face.
  const tieInset = cover + tieDb / 2;
  const maxDb = bars.reduce((m, bar) => Math.max(m, bar.db), 0);
  const tieBend = Math.max(tieDb * 2, maxDb / 2 + tieDb / 2);
  const sizes = [...new Set(bars.map((bar) => bar.size))].join(", ");
  const dimY = H / 2 + pad * 0.35;
  const dimX = W / 2 + pad * 0.35;
  const tick = size * 0.03;

  return (
    <svg
      role="img"
      aria-label={`${title}: ${shape === "circle" ? `round, D = ${formatQuantity(D, "length", units)}` : `${formatQuantity(b, "length", units)} wide × ${formatQuantity(h, "length", units)} deep`}, ${bars.length} bars (${sizes}), clear cover ${formatQuantity(cover, "length", units)}`}
      viewBox={viewBox}
      width={width}
      height={heightPx}
      className="max-w-full"
      data-testid="section-sketch"
    >
      <title>{title}</title>
      {/* concrete */}
      {shape === "circle" ? (
        <circle cx={0} cy={0} r={W / 2} fill="#ece8dd" stroke="#333c46" strokeWidth={stroke * 1.5} />
      ) : (
        <rect x={-W / 2} y={-H / 2} width={W} height={H} fill="#ece8dd" stroke="#333c46" strokeWidth={stroke * 1.5} />
      )}
      {/* tie / spiral centreline, drawn at its own thickness */}
      {shape === "circle" ? (
        <circle cx={0} cy={0} r={W / 2 - tieInset} fill="none" stroke="#56606b" strokeWidth={tieDb} strokeDasharray={confinement === "spiral" ? `${tieDb * 3} ${tieDb * 1.5}` : undefined} />
      ) : (
        <rect x={-W / 2 + tieInset} y={-H / 2 + tieInset} width={W - 2 * tieInset} height={H - 2 * tieInset} rx={tieBend} fill="none" stroke="#56606b" strokeWidth={tieDb} />
      )}
      {/* bending axes */}
      <g stroke="#9a4421" strokeWidth={stroke} strokeDasharray={`${size * 0.02} ${size * 0.015}`}>
        <line x1={-W / 2 - pad * 0.2} y1={0} x2={W / 2 + pad * 0.2} y2={0} />
        <line x1={0} y1={-H / 2 - pad * 0.2} x2={0} y2={H / 2 + pad * 0.2} />
      </g>
      <text x={W / 2 + pad * 0.22} y={font * 0.35} fontSize={font} fill="#9a4421">
        x
      </text>
      <text x={font * 0.3} y={-H / 2 - pad * 0.22} fontSize={font} fill="#9a4421">
        y
      </text>
      {/* bars (SVG y runs down: section +y is drawn up) */}
      {bars.map((bar, i) => (
        <circle key={i} cx={bar.x} cy={-bar.y} r={bar.db / 2} fill="#1b2129" data-testid="sketch-bar">
          <title>
            {bar.size} at x = {formatQuantity(bar.x, "length", units)}, y = {formatQuantity(bar.y, "length", units)}
          </title>
        </circle>
      ))}
      {/* dimension along x (below) */}
      <g stroke="#333c46" strokeWidth={stroke}>
        <line x1={-W / 2} y1={dimY} x2={W / 2} y2={dimY} />
        <line x1={-W / 2} y1={dimY - tick} x2={-W / 2} y2={dimY + tick} />
        <line x1={W / 2} y1={dimY - tick} x2={W / 2} y2={dimY + tick} />
      </g>
      <text x={0} y={dimY + font * 1.3} fontSize={font} textAnchor="middle" fill="#1b2129">
        {shape === "circle" ? `D = ${formatQuantity(D, "length", units)}` : `b = ${formatQuantity(b, "length", units)}`}
      </text>
      {shape === "rect" ? (
        <>
          <g stroke="#333c46" strokeWidth={stroke}>
            <line x1={dimX} y1={-H / 2} x2={dimX} y2={H / 2} />
            <line x1={dimX - tick} y1={-H / 2} x2={dimX + tick} y2={-H / 2} />
            <line x1={dimX - tick} y1={H / 2} x2={dimX + tick} y2={H / 2} />
          </g>
          <text x={dimX + font * 0.5} y={0} fontSize={font} fill="#1b2129" transform={`rotate(90 ${dimX + font * 0.5} 0)`} textAnchor="middle">
            h = {formatQuantity(h, "length", units)}
          </text>
        </>
      ) : null}
      <text x={-W / 2 - pad * 0.95} y={-H / 2 - pad * 0.3} fontSize={font * 0.85} fill="#56606b">
        {bars.length} {sizes} · cover {formatQuantity(cover, "length", units)}
      </text>
    </svg>
  );
}
