/**
 * Database schema (Drizzle, PostgreSQL). Every mutable row carries createdAt, updatedAt and a
 * `version` used for optimistic concurrency: writers send the version they read and a stale
 * write is refused with 409.
 */
import {
  pgTable,
  pgEnum,
  uuid,
  text,
  integer,
  doublePrecision,
  boolean,
  timestamp,
  jsonb,
  uniqueIndex,
  index,
  primaryKey,
} from "drizzle-orm/pg-core";

const timestamps = {
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  version: integer("version").notNull().default(1),
};

export const roleEnum = pgEnum("role", ["owner", "engineer", "estimator", "reviewer"]);
export const searchStatusEnum = pgEnum("search_status", ["queued", "running", "done", "failed", "cancelled"]);
export const adoptionStatusEnum = pgEnum("adoption_status", ["proposed", "approved", "rejected", "superseded"]);
export const mailStatusEnum = pgEnum("mail_status", ["pending", "sent", "failed"]);

export const users = pgTable("users", {
  id: uuid("id").primaryKey().defaultRandom(),
  email: text("email").notNull().unique(),
  name: text("name").notNull().default(""),
  passwordHash: text("password_hash"),
  emailVerified: timestamp("email_verified", { withTimezone: true }),
  image: text("image"),
  ...timestamps,
});

/** next-auth tables (OAuth accounts, database sessions, e-mail verification tokens). */
export const accounts = pgTable(
  "accounts",
  {
    userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
    type: text("type").notNull(),
    provider: text("provider").notNull(),
    providerAccountId: text("provider_account_id").notNull(),
    refresh_token: text("refresh_token"),
    access_token: text("access_token"),
    expires_at: integer("expires_at"),
    token_type: text("token_type"),
    scope: text("scope"),
    id_token: text("id_token"),
    session_state: text("session_state"),
  },
  (t) => [primaryKey({ columns: [t.provider, t.providerAccountId] })],
);

export const sessions = pgTable("sessions", {
  sessionToken: text("session_token").primaryKey(),
  userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
  expires: timestamp("expires", { withTimezone: true }).notNull(),
});

export const verificationTokens = pgTable(
  "verification_tokens",
  {
    identifier: text("identifier").notNull(),
    /** SHA-256 of the token sent by e-mail; the token itself is never stored */
    token: text("token").notNull(),
    expires: timestamp("expires", { withTimezone: true }).notNull(),
    usedAt: timestamp("used_at", { withTimezone: true }),
  },
  (t) => [primaryKey({ columns: [t.identifier, t.token] })],
);

export const signInAttempts = pgTable(
  "sign_in_attempts",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    key: text("key").notNull(),
    ok: boolean("ok").notNull(),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("sign_in_attempts_key_at").on(t.key, t.at)],
);

export const workspaces = pgTable("workspaces", {
  id: uuid("id").primaryKey().defaultRandom(),
  name: text("name").notNull(),
  slug: text("slug").notNull().unique(),
  ...timestamps,
});

export const memberships = pgTable(
  "memberships",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id").notNull().references(() => workspaces.id, { onDelete: "cascade" }),
    userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
    role: roleEnum("role").notNull(),
    ...timestamps,
  },
  (t) => [uniqueIndex("memberships_workspace_user").on(t.workspaceId, t.userId)],
);

export const invitations = pgTable("invitations", {
  id: uuid("id").primaryKey().defaultRandom(),
  workspaceId: uuid("workspace_id").notNull().references(() => workspaces.id, { onDelete: "cascade" }),
  email: text("email").notNull(),
  role: roleEnum("role").notNull(),
  tokenHash: text("token_hash").notNull().unique(),
  invitedBy: uuid("invited_by").references(() => users.id, { onDelete: "set null" }),
  expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
  acceptedAt: timestamp("accepted_at", { withTimezone: true }),
  ...timestamps,
});

export const projects = pgTable(
  "projects",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id").notNull().references(() => workspaces.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    codeBasis: text("code_basis").notNull().default("ACI 318-19"),
    units: text("units").notNull().default("US"),
    exposure: text("exposure").notNull().default("interior"),
    /** clear cover to ties, in */
    cover: doublePrecision("cover").notNull().default(1.5),
    eiOption: text("ei_option").notNull().default("b"),
    /** nominal maximum aggregate size, in */
    dagg: doublePrecision("dagg").notNull().default(0.75),
    notes: text("notes").notNull().default(""),
    ...timestamps,
  },
  (t) => [index("projects_workspace").on(t.workspaceId)],
);

/** Price books are versioned: each edit writes a new row, so results can name the version they used. */
export const priceBooks = pgTable(
  "price_books",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id").notNull().references(() => projects.id, { onDelete: "cascade" }),
    revision: integer("revision").notNull(),
    prices: jsonb("prices").notNull(),
    carbon: jsonb("carbon").notNull(),
    /** $ per distinct form set, used by standardization */
    formSet: doublePrecision("form_set").notNull().default(0),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    ...timestamps,
  },
  (t) => [uniqueIndex("price_books_project_revision").on(t.projectId, t.revision)],
);

export const columnMarks = pgTable(
  "column_marks",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id").notNull().references(() => projects.id, { onDelete: "cascade" }),
    label: text("label").notNull(),
    level: text("level").notNull().default(""),
    quantity: integer("quantity").notNull().default(1),
    /** member data in the engine's contract shape (lu, lux, luy, kx, ky, braced, psi, sway, ...) */
    member: jsonb("member").notNull(),
    /** architect's and user's section limits (maxB, maxH, maxD, squareOnly, note) */
    limits: jsonb("limits").notNull().default({}),
    /** the current design: a section in the contract shape, plus braceLevels */
    design: jsonb("design").notNull(),
    ...timestamps,
  },
  (t) => [uniqueIndex("column_marks_project_label_level").on(t.projectId, t.label, t.level)],
);

export const loadCombinations = pgTable(
  "load_combinations",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    markId: uuid("mark_id").notNull().references(() => columnMarks.id, { onDelete: "cascade" }),
    position: integer("position").notNull().default(0),
    name: text("name").notNull(),
    /** factored axial load, kip */
    Pu: doublePrecision("pu").notNull(),
    betaDns: doublePrecision("beta_dns").notNull().default(0),
    Mx: jsonb("mx").notNull(),
    My: jsonb("my"),
    importId: uuid("import_id"),
    ...timestamps,
  },
  (t) => [index("load_combinations_mark").on(t.markId)],
);

/** The original CSV of every import, kept for traceability. */
export const loadImports = pgTable("load_imports", {
  id: uuid("id").primaryKey().defaultRandom(),
  projectId: uuid("project_id").notNull().references(() => projects.id, { onDelete: "cascade" }),
  markId: uuid("mark_id").references(() => columnMarks.id, { onDelete: "set null" }),
  kind: text("kind").notNull(),
  filename: text("filename").notNull(),
  content: text("content").notNull(),
  rowsImported: integer("rows_imported").notNull(),
  rowsSkipped: integer("rows_skipped").notNull().default(0),
  createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
});

export const searches = pgTable(
  "searches",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    markId: uuid("mark_id").notNull().references(() => columnMarks.id, { onDelete: "cascade" }),
    status: searchStatusEnum("status").notNull().default("queued"),
    request: jsonb("request").notNull(),
    priceBookId: uuid("price_book_id").references(() => priceBooks.id, { onDelete: "set null" }),
    /** fingerprint of the loads and member the search ran with (stale detection) */
    inputsHash: text("inputs_hash").notNull(),
    progress: doublePrecision("progress").notNull().default(0),
    kept: integer("kept").notNull().default(0),
    stats: jsonb("stats"),
    error: text("error"),
    jobId: text("job_id"),
    attempt: integer("attempt").notNull().default(0),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    startedAt: timestamp("started_at", { withTimezone: true }),
    finishedAt: timestamp("finished_at", { withTimezone: true }),
    ...timestamps,
  },
  (t) => [index("searches_mark").on(t.markId)],
);

export const candidates = pgTable(
  "candidates",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    searchId: uuid("search_id").notNull().references(() => searches.id, { onDelete: "cascade" }),
    candidateId: text("candidate_id").notNull(),
    shape: text("shape").notNull(),
    cost: doublePrecision("cost").notNull(),
    carbon: doublePrecision("carbon").notNull(),
    utilization: doublePrecision("utilization").notNull(),
    onFront: boolean("on_front").notNull().default(false),
    data: jsonb("data").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("candidates_search_candidate").on(t.searchId, t.candidateId)],
);

export const adoptedAlternatives = pgTable(
  "adopted_alternatives",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    markId: uuid("mark_id").notNull().references(() => columnMarks.id, { onDelete: "cascade" }),
    searchId: uuid("search_id").references(() => searches.id, { onDelete: "set null" }),
    candidateId: text("candidate_id").notNull(),
    candidate: jsonb("candidate").notNull(),
    status: adoptionStatusEnum("status").notNull().default("proposed"),
    inputsHash: text("inputs_hash").notNull(),
    priceBookId: uuid("price_book_id").references(() => priceBooks.id, { onDelete: "set null" }),
    proposedBy: uuid("proposed_by").references(() => users.id, { onDelete: "set null" }),
    decidedBy: uuid("decided_by").references(() => users.id, { onDelete: "set null" }),
    comment: text("comment").notNull().default(""),
    decidedAt: timestamp("decided_at", { withTimezone: true }),
    ...timestamps,
  },
  (t) => [index("adopted_alternatives_mark").on(t.markId)],
);

export const auditLog = pgTable(
  "audit_log",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id").references(() => workspaces.id, { onDelete: "cascade" }),
    userId: uuid("user_id").references(() => users.id, { onDelete: "set null" }),
    action: text("action").notNull(),
    entity: text("entity").notNull(),
    entityId: text("entity_id"),
    before: jsonb("before"),
    after: jsonb("after"),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("audit_log_workspace_at").on(t.workspaceId, t.at)],
);

export const mailOutbox = pgTable(
  "mail_outbox",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id").references(() => workspaces.id, { onDelete: "set null" }),
    to: text("to").notNull(),
    subject: text("subject").notNull(),
    text: text("text").notNull(),
    html: text("html"),
    status: mailStatusEnum("status").notNull().default("pending"),
    attempts: integer("attempts").notNull().default(0),
    lastError: text("last_error"),
    sentAt: timestamp("sent_at", { withTimezone: true }),
    ...timestamps,
  },
  (t) => [index("mail_outbox_status").on(t.status)],
);
