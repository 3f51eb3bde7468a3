/**
 * CSV upload requests (load combinations of one mark, or of many marks from one file). The
 * file travels as text so the original can be kept with the import for traceability.
 */
import { z } from "zod";
import { UNIT_SYSTEMS } from "./project";

/** 2 MB of CSV is tens of thousands of rows: far more than any frame analysis export per project. */
export const MAX_CSV_CHARS = 2_000_000;

export const csvImportSchema = z
  .object({
    filename: z.string().trim().min(1, "the file needs a name").max(200),
    content: z.string().min(1, "the file is empty").max(MAX_CSV_CHARS, "the file is larger than 2 MB"),
    /** preview parses and reports; commit writes (all rows or none unless skipInvalid) */
    mode: z.enum(["preview", "commit"]).default("preview"),
    /** import the valid rows and leave out the bad ones (the user's explicit choice) */
    skipInvalid: z.boolean().default(false),
    /** replace the mark's existing combinations (true) or add to them (false) */
    replace: z.boolean().default(true),
    /** the file's units; the project's when absent */
    units: z.enum(UNIT_SYSTEMS).optional(),
  })
  .strict();

export type CsvImport = z.infer<typeof csvImportSchema>;
