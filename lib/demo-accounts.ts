/**
 * The demo workspace: an invented firm with one member per role. Local demo only — these passwords
 * are printed by `npm start` and never used outside this machine.
 */
export const DEMO_WORKSPACE = { name: "Lindqvist Oduya Structural", slug: "lindqvist-oduya" } as const;

export const DEMO_ACCOUNTS = [
  { email: "owner@lindqvist-oduya.test", name: "Maren Lindqvist", role: "owner", password: "owner-demo-2026" },
  { email: "engineer@lindqvist-oduya.test", name: "Tobi Oduya", role: "engineer", password: "engineer-demo-2026" },
  { email: "estimator@lindqvist-oduya.test", name: "Priya Castellanos", role: "estimator", password: "estimator-demo-2026" },
  { email: "reviewer@lindqvist-oduya.test", name: "Jonas Whitcombe", role: "reviewer", password: "reviewer-demo-2026" },
] as const;
