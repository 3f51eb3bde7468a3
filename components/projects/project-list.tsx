"use client";
/** The workspace's projects, and the form that starts a new one (owners and engineers). */
import Link from "next/link";
import { useState } from "react";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { callApi, issuesByPath } from "./api";
import { QueryBoundary } from "./query-boundary";

interface ProjectSummary {
  id: string;
  name: string;
  codeBasis: string;
  units: string;
  marks: number;
  updatedAt: string;
}

export interface ProjectListProps {
  workspaceId: string;
}

export function ProjectList(props: ProjectListProps) {
  return (
    <QueryBoundary>
      <ProjectListInner {...props} />
    </QueryBoundary>
  );
}

function ProjectListInner({ workspaceId }: ProjectListProps) {
  const queryClient = useQueryClient();
  const key = ["projects", workspaceId];
  const list = useQuery({
    queryKey: key,
    queryFn: () => callApi<{ projects: ProjectSummary[]; canCreate: boolean; role: string }>(`/api/projects?workspaceId=${workspaceId}`),
  });
  const [name, setName] = useState("");
  const [units, setUnits] = useState<"US" | "SI">("US");
  const create = useMutation({
    mutationFn: () => callApi<{ project: { id: string } }>("/api/projects", { method: "POST", body: { workspaceId, name, units } }),
    onSuccess: async () => {
      setName("");
      await queryClient.invalidateQueries({ queryKey: key });
    },
  });
  const errors = issuesByPath(create.error);

  if (list.isPending) return <p className="text-ink-500">Loading projects…</p>;
  if (list.isError) return <p role="alert" className="text-strained-600">Projects could not be loaded: {list.error.message}</p>;
  const { projects, canCreate } = list.data;

  return (
    <div className="space-y-8">
      {projects.length === 0 ? (
        <div className="panel">
          <h2 className="text-lg font-semibold">No projects yet</h2>
          <p className="mt-2 text-ink-700">
            {canCreate
              ? "Start a project below: give it a name and its units. Then add its column marks and their load combinations, and check each mark with slenderness included."
              : "An owner or engineer of this workspace creates projects; once they do, they appear here for you to read."}
          </p>
        </div>
      ) : (
        <table className="w-full border-collapse text-sm">
          <caption className="sr-only">Projects</caption>
          <thead>
            <tr className="border-b border-stone-200 text-left text-ink-500">
              <th className="py-2 font-medium">Project</th>
              <th className="py-2 font-medium">Code basis</th>
              <th className="py-2 font-medium">Units</th>
              <th className="py-2 text-right font-medium">Column marks</th>
            </tr>
          </thead>
          <tbody>
            {projects.map((p) => (
              <tr key={p.id} className="border-b border-stone-100">
                <td className="py-2">
                  <Link href={`/w/${workspaceId}/projects/${p.id}`} className="font-medium text-oxide-700 hover:underline">
                    {p.name}
                  </Link>
                </td>
                <td className="py-2">{p.codeBasis}</td>
                <td className="py-2">{p.units}</td>
                <td className="py-2 text-right tabular-nums">{p.marks}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}

      {canCreate ? (
        <form
          className="panel max-w-xl space-y-4"
          aria-label="New project"
          onSubmit={(e) => {
            e.preventDefault();
            create.mutate();
          }}
        >
          <h2 className="text-lg font-semibold">New project</h2>
          <div>
            <label htmlFor="project-name" className="field-label">
              Project name
            </label>
            <input
              id="project-name"
              className="field-input"
              value={name}
              onChange={(e) => setName(e.target.value)}
              placeholder="e.g. Ferry Terminal Garage"
              aria-invalid={errors.name ? true : undefined}
            />
            {errors.name ? <p className="field-error">{errors.name}</p> : null}
          </div>
          <fieldset>
            <legend className="field-label">Units</legend>
            <div className="mt-1 flex gap-4 text-sm">
              <label className="flex items-center gap-2">
                <input type="radio" name="units" checked={units === "US"} onChange={() => setUnits("US")} /> US (in, kip, ksi)
              </label>
              <label className="flex items-center gap-2">
                <input type="radio" name="units" checked={units === "SI"} onChange={() => setUnits("SI")} /> SI (mm, kN, MPa)
              </label>
            </div>
          </fieldset>
          <p className="text-xs text-ink-500">Code basis ACI 318-19; cover, exposure and the EI option can be set in the project settings afterwards.</p>
          {create.isError && !errors.name ? <p className="field-error">{create.error.message}</p> : null}
          <button type="submit" className="btn-primary" disabled={create.isPending}>
            {create.isPending ? "Creating…" : "Create project"}
          </button>
        </form>
      ) : null}
    </div>
  );
}
