/**
 * The text and naming helpers of the packages and the schedule (no database): symbols spelled out
 * for Helvetica's WinAnsi encoding, number formats, chart tick steps and download file names.
 */
import { describe, expect, it } from "vitest";
import { money, num, pdfText } from "@/lib/reports/pdf-text";
import { niceStep } from "@/lib/reports/draw-interaction-diagram";
import { safeFileName } from "@/lib/reports/pdf-response";
import { scheduleFileName } from "@/lib/schedule/schedule-csv";
import { CAUTION } from "@/lib/caution";

describe("pdfText", () => {
  it("spells out Greek letters and signs Helvetica cannot print", () => {
    expect(pdfText("φMn ≥ Mc, δ ≤ 1.4, k ℓu/r, βdns, ψA, δs, √f'c, π²")).toBe("phiMn >= Mc, delta <= 1.4, k l_u/r, beta_dns, psi_A, delta_s, sqrtf'c, pi²");
    expect(pdfText("0.85 f'c (Ag − Ast)")).toBe("0.85 f'c (Ag - Ast)");
  });
  it("keeps what WinAnsi holds and replaces anything else with ?", () => {
    expect(pdfText("18×22 in, 1–2 %, 26.4°, in² in³ · é — “q”")).toBe("18×22 in, 1–2 %, 26.4°, in² in³ · é — “q”");
    expect(pdfText("∑ 中")).toBe("? ?");
  });
  it("leaves no unprintable character in the caution", () => {
    const text = pdfText(CAUTION);
    expect(text).toContain("beta_dns");
    expect(text).not.toContain("?");
  });
});

describe("number formats", () => {
  it("separates thousands and trims decimals; a missing value is a dash", () => {
    expect(num(14437995.4, 0)).toBe("14,437,995");
    expect(num(0.40097, 3)).toBe("0.401");
    expect(num(-0.0001, 2)).toBe("0");
    expect(num(null)).toBe("—");
    expect(num(Number.POSITIVE_INFINITY)).toBe("—");
    expect(money(1454.444)).toBe("$1,454.44");
  });
});

describe("niceStep", () => {
  it("picks 1, 2 or 5 times a power of ten", () => {
    expect(niceStep(7000)).toBe(2000);
    expect(niceStep(2400)).toBe(500);
    expect(niceStep(6)).toBe(1);
    expect(niceStep(0)).toBe(1);
  });
});

describe("file names", () => {
  it("reduces project names to safe characters", () => {
    expect(scheduleFileName("Quarry Lane / Depot #2")).toBe("Quarry-Lane-Depot-2-column-schedule.csv");
    expect(scheduleFileName("   ")).toBe("project-column-schedule.csv");
    expect(safeFileName('Kiln "Yard"-C-1-calculation.pdf')).toBe("Kiln-Yard-C-1-calculation.pdf");
  });
});
