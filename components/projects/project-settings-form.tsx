"use client";
/** Project settings: name, code basis, units, exposure and cover, default EI option, aggregate size, notes. */
import { useState } from "react";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { ApiError, callApi, issuesByPath } from "./api";
import { ConflictNotice } from "./conflict-notice";
import { NumberField } from "./number-field";
import { QueryBoundary } from "./query-boundary";
import { projectKey, useProject, type ProjectRecord } from "./use-project";
import { useDraft } from "./use-draft";

export interface ProjectSettingsFormProps {
  projectId: string;
}

type Editable = Pick<ProjectRecord, "name" | "units" | "exposure" | "cover" | "eiOption" | "dagg" | "notes">;

const FIELDS: Array<{ key: keyof Editable; label: string }> = [
  { key: "name", label: "Project name" },
  { key: "units", label: "Units" },
  { key: "exposure", label: "Exposure" },
  { key: "cover", label: "Clear cover to ties (in)" },
  { key: "eiOption", label: "Default EI option" },
  { key: "dagg", label: "Maximum aggregate size (in)" },
  { key: "notes", label: "Notes" },
];

const MIN_COVER: Record<Editable["exposure"], number> = { interior: 1.5, exposed: 2, earth: 3 };

export function ProjectSettingsForm(props: ProjectSettingsFormProps) {
  return (
    <QueryBoundary>
      <SettingsInner {...props} />
    </QueryBoundary>
  );
}

function pick(p: ProjectRecord): Editable {
  return { name: p.name, units: p.units, exposure: p.exposure, cover: p.cover, eiOption: p.eiOption, dagg: p.dagg, notes: p.notes };
}

function SettingsInner({ projectId }: ProjectSettingsFormProps) {
  const query = useProject(projectId);
  if (query.isPending) return <p className="text-ink-500">Loading…</p>;
  if (query.isError) return <p role="alert">The project could not be loaded: {query.error.message}</p>;
  return <SettingsForm key={query.data.project.version} project={query.data.project} canEdit={query.data.can.editProject} />;
}

function SettingsForm({ project, canEdit }: { project: ProjectRecord; canEdit: boolean }) {
  const queryClient = useQueryClient();
  const [draft, setDraft, clearDraft, restored] = useDraft<Editable>(`project:${project.id}`, pick(project), project.version);
  const [saved, setSaved] = useState(false);
  const save = useMutation({
    mutationFn: () => callApi<{ project: ProjectRecord }>(`/api/projects/${project.id}`, { method: "PATCH", body: { version: project.version, ...draft } }),
    onSuccess: async () => {
      clearDraft();
      setSaved(true);
      await queryClient.invalidateQueries({ queryKey: projectKey(project.id) });
    },
  });
  const errors = issuesByPath(save.error);
  const set = <K extends keyof Editable>(k: K, v: Editable[K]) => {
    setSaved(false);
    setDraft({ ...draft, [k]: v });
  };
  const conflict = save.error instanceof ApiError && save.error.status === 409 ? (save.error.current as ProjectRecord) : null;

  return (
    <form
      aria-label="Project settings"
      className="panel max-w-2xl space-y-5"
      onSubmit={(e) => {
        e.preventDefault();
        save.mutate();
      }}
    >
      {restored ? <p className="text-sm text-ink-500">Unsaved changes from your last visit were restored.</p> : null}
      {!canEdit ? <p className="text-sm text-ink-500">Your role reads these settings; owners and engineers change them.</p> : null}
      <fieldset disabled={!canEdit} className="space-y-5">
        <div>
          <label htmlFor="s-name" className="field-label">
            Project name
          </label>
          <input id="s-name" className="field-input" value={draft.name} onChange={(e) => set("name", e.target.value)} />
          {errors.name ? <p className="field-error">{errors.name}</p> : null}
        </div>
        <div>
          <label htmlFor="s-code" className="field-label">
            Code basis
          </label>
          <select id="s-code" className="field-input" value="ACI 318-19" disabled>
            <option>ACI 318-19</option>
          </select>
          <p className="mt-1 text-xs text-ink-500">The one edition checked.</p>
        </div>
        <fieldset>
          <legend className="field-label">Units (stored in US; SI is shown and entered in mm, kN, kN·m, MPa)</legend>
          <div className="mt-1 flex gap-4 text-sm">
            {(["US", "SI"] as const).map((u) => (
              <label key={u} className="flex items-center gap-2">
                <input type="radio" name="units" checked={draft.units === u} onChange={() => set("units", u)} /> {u}
              </label>
            ))}
          </div>
        </fieldset>
        <div className="grid gap-4 sm:grid-cols-2">
          <div>
            <label htmlFor="s-exposure" className="field-label">
              Exposure
            </label>
            <select id="s-exposure" className="field-input" value={draft.exposure} onChange={(e) => set("exposure", e.target.value as Editable["exposure"])}>
              <option value="interior">Not exposed to weather or earth</option>
              <option value="exposed">Exposed to weather or earth</option>
              <option value="earth">Cast against and permanently in contact with earth</option>
            </select>
            <p className="mt-1 text-xs text-ink-500">Minimum cover {MIN_COVER[draft.exposure]} in (Table 20.5.1.3.1).</p>
          </div>
          <NumberField
            label="Clear cover to ties"
            quantity="length"
            units={draft.units}
            value={draft.cover}
            onChange={(v) => set("cover", v ?? 0)}
            error={errors.cover ?? (draft.cover < MIN_COVER[draft.exposure] ? `below the ${MIN_COVER[draft.exposure]} in minimum for this exposure` : undefined)}
            hint="Default for new marks' sections."
          />
          <div>
            <label htmlFor="s-ei" className="field-label">
              Default EI option (6.6.4.4.4)
            </label>
            <select id="s-ei" className="field-input" value={draft.eiOption} onChange={(e) => set("eiOption", e.target.value as Editable["eiOption"])}>
              <option value="a">(a) 0.4 Ec Ig / (1 + βdns)</option>
              <option value="b">(b) (0.2 Ec Ig + Es Ise) / (1 + βdns)</option>
              <option value="c">(c) Ec I / (1 + βdns), I from Table 6.6.3.1.1(b)</option>
            </select>
          </div>
          <NumberField label="Maximum aggregate size" quantity="length" units={draft.units} value={draft.dagg} onChange={(v) => set("dagg", v ?? 0)} error={errors.dagg} hint="Sets the clear bar spacing minimum 4/3 dagg (25.2.3)." />
        </div>
        <div>
          <label htmlFor="s-notes" className="field-label">
            Notes
          </label>
          <textarea id="s-notes" rows={4} className="field-input" value={draft.notes} onChange={(e) => set("notes", e.target.value)} />
          {errors.notes ? <p className="field-error">{errors.notes}</p> : null}
        </div>
      </fieldset>
      {conflict ? (
        <ConflictNotice
          mine={{ ...pick(project), version: project.version }}
          current={conflict as unknown as Record<string, unknown>}
          fields={FIELDS}
          onReload={() => {
            clearDraft();
            void queryClient.invalidateQueries({ queryKey: projectKey(project.id) });
          }}
        />
      ) : save.isError ? (
        <p role="alert" className="field-error">
          {save.error.message}
        </p>
      ) : null}
      {canEdit ? (
        <div className="flex items-center gap-3">
          <button type="submit" className="btn-primary" disabled={save.isPending}>
            {save.isPending ? "Saving…" : "Save settings"}
          </button>
          {saved ? <span className="text-sm text-sound-600">Saved.</span> : null}
        </div>
      ) : null}
    </form>
  );
}
