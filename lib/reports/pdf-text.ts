/**
 * Text for PDF pages set in the built-in Helvetica, whose WinAnsi encoding has no Greek letters
 * and few mathematical signs. Symbols are written as words the trade reads without a key
 * (phi, delta, psi, beta_dns, l_u, <=), so nothing prints as a wrong glyph; characters WinAnsi
 * does hold (× ² ³ · – — ° é) are kept. Anything else left becomes "?" rather than garbage.
 */

const REPLACEMENTS: Array<[string, string]> = [
  ["βdns", "beta_dns"],
  ["βds", "beta_ds"],
  ["β1", "beta1"],
  ["δs", "delta_s"],
  ["δns", "delta_ns"],
  ["ℓu", "l_u"],
  ["ℓc", "l_c"],
  ["εcu", "eps_cu"],
  ["εty", "eps_ty"],
  ["εt", "eps_t"],
  ["ρs", "rho_s"],
  ["ψA", "psi_A"],
  ["ψB", "psi_B"],
  ["φ", "phi"],
  ["Φ", "phi"],
  ["δ", "delta"],
  ["Δ", "Delta"],
  ["ψ", "psi"],
  ["β", "beta"],
  ["ℓ", "l"],
  ["ε", "eps"],
  ["ρ", "rho"],
  ["θ", "theta"],
  ["π", "pi"],
  ["Σ", "sum "],
  ["λ", "lambda"],
  ["μ", "mu"],
  ["≤", "<="],
  ["≥", ">="],
  ["≠", "!="],
  ["≈", "~"],
  ["√", "sqrt"],
  ["∞", "infinity"],
  ["−", "-"],
  ["′", "'"],
  ["″", "\""],
  ["→", "->"],
  ["⁴", "^4"],
  ["⁻", "^-"],
  ["¹", "^1"],
  ["₁", "1"],
  ["₂", "2"],
  ["⌈", "ceil("],
  ["⌉", ")"],
  ["\u2009", " "],
  ["\u202f", " "],
];

/** The code points of Windows-1252 (WinAnsi) between 0x80 and 0x9F. */
const WIN_ANSI_EXTRA = new Set("€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ");

function isWinAnsi(ch: string): boolean {
  const cp = ch.codePointAt(0) ?? 0;
  if (cp === 0x0a || cp === 0x09) return true;
  if (cp >= 0x20 && cp <= 0x7e) return true;
  if (cp >= 0xa0 && cp <= 0xff) return true;
  return WIN_ANSI_EXTRA.has(ch);
}

/** Text made printable in Helvetica (WinAnsi): symbols as words, unknown characters as "?". */
export function pdfText(text: string): string {
  let out = text;
  for (const [from, to] of REPLACEMENTS) if (out.includes(from)) out = out.split(from).join(to);
  let clean = "";
  for (const ch of out) clean += isWinAnsi(ch) ? ch : "?";
  return clean;
}

const nf = new Map<number, Intl.NumberFormat>();

/** A number with thousands separators and at most `digits` decimals; "—" for null / non-finite. */
export function num(value: number | null | undefined, digits = 2): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  let f = nf.get(digits);
  if (!f) {
    f = new Intl.NumberFormat("en-US", { maximumFractionDigits: digits, minimumFractionDigits: 0 });
    nf.set(digits, f);
  }
  const s = f.format(value);
  return s === "-0" ? "0" : s;
}

/** Money: "$1,234.56". */
export function money(value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  return `$${new Intl.NumberFormat("en-US", { minimumFractionDigits: 2, maximumFractionDigits: 2 }).format(value)}`;
}
