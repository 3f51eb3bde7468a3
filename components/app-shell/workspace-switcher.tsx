"use client";
import { useRouter } from "next/navigation";
import { useId } from "react";

export interface WorkspaceOption {
  id: string;
  name: string;
  role: string;
}

export interface WorkspaceSwitcherProps {
  workspaces: readonly WorkspaceOption[];
  currentId?: string;
}

/** A labelled select: keyboard-friendly, and a change goes straight to that workspace. */
export function WorkspaceSwitcher({ workspaces, currentId }: WorkspaceSwitcherProps) {
  const router = useRouter();
  const id = useId();
  return (
    <div className="flex items-center gap-2">
      <label htmlFor={id} className="sr-only">
        Workspace
      </label>
      <select
        id={id}
        value={currentId ?? ""}
        onChange={(e) => {
          const next = e.target.value;
          if (next === "__new") router.push("/w?new=1");
          else if (next) router.push(`/w/${next}`);
        }}
        className="max-w-[16rem] truncate rounded-md border border-stone-300 bg-white py-1.5 pl-2 pr-8 text-sm font-medium text-ink-900 focus:border-oxide-500 focus:outline-none"
      >
        {currentId ? null : <option value="">Choose a workspace</option>}
        {workspaces.map((w) => (
          <option key={w.id} value={w.id}>
            {w.name} · {w.role}
          </option>
        ))}
        <option value="__new">+ New workspace…</option>
      </select>
    </div>
  );
}
