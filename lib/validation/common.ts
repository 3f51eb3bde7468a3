/**
 * Small zod building blocks shared by the entity schemas (section, member, load case, ...).
 * Every message names the rule, so an issue reads "loads.0.Pu: Pu must be a finite number".
 */
import { z } from "zod";
import { isBarSize } from "../../engine/rebar";
import type { BarSize } from "../../engine/types";

/** A finite number (zod 4 rejects NaN and ±Infinity). */
export const finite = (what: string) => z.number({ error: `${what} must be a finite number` });
export const positive = (what: string) => finite(what).positive(`${what} must be > 0`);
export const nonNegative = (what: string) => finite(what).min(0, `${what} must be ≥ 0`);

/** A known bar designation: US #3…#18 (ASTM A615) or metric 10…57 (A615M). */
export const barSizeSchema = z
  .string({ error: "bar size must be a string such as \"#8\" or \"25\"" })
  .refine(isBarSize, { message: "unknown bar size (expected #3…#11, #14, #18 or metric 10…57)" })
  .transform((s) => s as BarSize);

export const unitsSchema = z.enum(["US", "SI"], { error: 'units must be "US" or "SI"' });

/** f'c-keyed table (keys like "5" or "4.5"). */
export const byStrength = (what: string) =>
  z.record(z.string().regex(/^\d+(\.\d+)?$/, "keys are f'c values such as \"5\""), nonNegative(what));
