"use client";
/** The project's name, basis and units, with links between its screens. */
import Link from "next/link";
import { usePathname } from "next/navigation";
import { useProject } from "./use-project";

export interface ProjectHeaderProps {
  workspaceId: string;
  projectId: string;
}

export function ProjectHeader({ workspaceId, projectId }: ProjectHeaderProps) {
  const project = useProject(projectId);
  const path = usePathname();
  const base = `/w/${workspaceId}/projects/${projectId}`;
  const tabs = [
    { href: base, label: "Column marks" },
    { href: `${base}/settings`, label: "Project settings" },
    { href: `${base}/price-book`, label: "Price book" },
    { href: `${base}/schedule`, label: "Column schedule" },
    { href: `${base}/form-reuse`, label: "Form reuse" },
  ];
  return (
    <header className="mb-6 border-b border-stone-200 pb-3">
      <p className="text-sm text-ink-500">
        <Link href={`/w/${workspaceId}`} className="hover:underline">
          Projects
        </Link>{" "}
        /
      </p>
      <h1 className="text-2xl font-semibold tracking-tight">{project.data?.project.name ?? "Project"}</h1>
      {project.data ? (
        <p className="text-sm text-ink-500">
          {project.data.project.codeBasis} · {project.data.project.units === "SI" ? "SI units (mm, kN, MPa)" : "US units (in, kip, ksi)"} · your role: {project.data.role}
        </p>
      ) : null}
      <nav aria-label="Project screens" className="no-print mt-3 flex gap-4 text-sm">
        {tabs.map((t) => (
          <Link key={t.href} href={t.href} aria-current={path === t.href ? "page" : undefined} className={path === t.href ? "font-semibold text-oxide-700 underline" : "text-ink-700 hover:underline"}>
            {t.label}
          </Link>
        ))}
      </nav>
    </header>
  );
}
