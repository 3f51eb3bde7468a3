/**
 * Shared runner for CLI commands (cli-contract.md): JSON on stdout; exit 0 pass / success,
 * 1 design fails, 2 invalid input with `{"error", "issues": [{"path", "message"}]}` on
 * stderr and nothing on stdout. Commands are modules exporting `command: CliCommand`,
 * listed in the table in scripts/cli.ts.
 */
import { readFile } from "node:fs/promises";
import type { z } from "zod";
import { formatIssues, type ValidationErrorBody } from "../validation/format-issues";

/** Where a command reads and writes (process streams in the CLI; buffers in tests). */
export interface CliIo {
  stdout(text: string): void;
  stderr(text: string): void;
  /** read a file, or standard input for "-" */
  readInput(fileOrDash: string): Promise<string>;
}

export interface CliCommand {
  name: string;
  /** one line for the usage text */
  usage: string;
  /** run with the arguments after the command name; returns the exit code (0 or 1) */
  run(args: string[], io: CliIo): Promise<number>;
}

/** Exit codes of the contract. */
export const EXIT_OK = 0;
export const EXIT_FAIL = 1;
export const EXIT_INVALID = 2;
/** an unexpected internal error (not part of the contract's input handling) */
export const EXIT_INTERNAL = 3;

/** Invalid input: carries the contract's error body. */
export class InputError extends Error {
  readonly body: ValidationErrorBody;
  constructor(body: ValidationErrorBody) {
    super(body.error);
    this.name = "InputError";
    this.body = body;
  }
}

/** Read and parse the JSON argument (a path or "-" for stdin). */
export async function readJsonArgument(args: string[], io: CliIo): Promise<unknown> {
  const src = args[0];
  if (src === undefined) {
    throw new InputError({ error: "missing input", issues: [{ path: "", message: "give a JSON file or - for standard input" }] });
  }
  let text: string;
  try {
    text = await io.readInput(src);
  } catch (e) {
    throw new InputError({ error: "cannot read input", issues: [{ path: "", message: `${src}: ${(e as Error).message}` }] });
  }
  try {
    return JSON.parse(text) as unknown;
  } catch (e) {
    throw new InputError({ error: "invalid JSON", issues: [{ path: "", message: (e as Error).message }] });
  }
}

/** Parse with a zod schema or throw InputError with the contract's issues. */
export function parseOrThrow<S extends z.ZodType>(schema: S, value: unknown, summary: string): z.output<S> {
  const r = schema.safeParse(value);
  if (!r.success) throw new InputError(formatIssues(r.error, summary));
  return r.data;
}

/** The dotted path an engine RangeError starts with ("section.bars.3 (...) lies outside ..."). */
function pathOfEngineMessage(message: string): string {
  const m = /^((?:section|member|loads|options|prices|carbon)(?:\.[A-Za-z0-9_]+)*)\b/.exec(message);
  return m?.[1] ?? "";
}

/**
 * Run one command with the contract's error mapping: InputError and engine RangeError /
 * TypeError → exit 2 with the error body on stderr; anything else → exit 3.
 *
 * @example process.exitCode = await runCommand(command, process.argv.slice(3), processIo)
 */
export async function runCommand(command: CliCommand, args: string[], io: CliIo): Promise<number> {
  try {
    return await command.run(args, io);
  } catch (e) {
    if (e instanceof InputError) {
      io.stderr(JSON.stringify(e.body) + "\n");
      return EXIT_INVALID;
    }
    if (e instanceof RangeError || e instanceof TypeError) {
      const body: ValidationErrorBody = {
        error: `invalid ${command.name} request`,
        issues: [{ path: pathOfEngineMessage(e.message), message: e.message }],
      };
      io.stderr(JSON.stringify(body) + "\n");
      return EXIT_INVALID;
    }
    io.stderr(JSON.stringify({ error: "internal error", issues: [], message: (e as Error)?.message ?? String(e) }) + "\n");
    return EXIT_INTERNAL;
  }
}

/** Streams of the running process. */
export const processIo: CliIo = {
  stdout: (t) => void process.stdout.write(t),
  stderr: (t) => void process.stderr.write(t),
  async readInput(src) {
    if (src !== "-") return readFile(src, "utf8");
    const chunks: Buffer[] = [];
    for await (const c of process.stdin) chunks.push(typeof c === "string" ? Buffer.from(c) : (c as Buffer));
    return Buffer.concat(chunks).toString("utf8");
  },
};

/** Write a JSON result to stdout. */
export function writeJson(io: CliIo, value: unknown): void {
  io.stdout(JSON.stringify(value, null, 2) + "\n");
}
