import type { Role } from "@/lib/permissions";

/** "an engineer", "an estimator", "an owner", "a reviewer". */
export function withArticle(role: Role | string): string {
  return `${/^[aeiou]/i.test(role) ? "an" : "a"} ${role}`;
}
