/**
 * Who may do what, per workspace role (product.md, "Who uses it"). The single table every route
 * handler and server action consults through `authorize`.
 */
export const ROLES = ["owner", "engineer", "estimator", "reviewer"] as const;
export type Role = (typeof ROLES)[number];

export const PERMISSIONS = {
  read: ["owner", "engineer", "estimator", "reviewer"],
  comment: ["owner", "engineer", "estimator", "reviewer"],
  downloadReport: ["owner", "engineer", "estimator", "reviewer"],
  manageMembers: ["owner"],
  readCapturedMail: ["owner"],
  deleteProject: ["owner"],
  editProject: ["owner", "engineer"],
  editMarks: ["owner", "engineer"],
  editLoads: ["owner", "engineer"],
  editPriceBook: ["owner", "engineer", "estimator"],
  runSearch: ["owner", "engineer", "estimator"],
  proposeAlternative: ["owner", "engineer", "estimator"],
  approveAlternative: ["owner", "engineer"],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

export function roleAllows(role: Role, permission: Permission): boolean {
  return (PERMISSIONS[permission] as readonly Role[]).includes(role);
}
