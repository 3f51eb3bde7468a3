"use client";
/**
 * The project's price book and carbon factors: concrete by f'c, reinforcing steel, formwork
 * (flat and round), bracing per level. Every save writes a new revision; results name the
 * revision they used. Owners, engineers and estimators edit; reviewers read.
 */
import { useState } from "react";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { ApiError, callApi, issuesByPath } from "./api";
import { NumberField } from "./number-field";
import { QueryBoundary } from "./query-boundary";
import { projectKey, useProject, type PriceBookRecord } from "./use-project";
import { formatNumber } from "./units";

export interface PriceBookEditorProps {
  projectId: string;
}

interface ConcreteRow {
  fc: number | undefined;
  price: number | undefined;
  carbon: number | undefined;
}

interface Draft {
  concrete: ConcreteRow[];
  steel: number | undefined;
  steelCarbon: number | undefined;
  formwork: number | undefined;
  roundFormwork: number | undefined;
  brace: number | undefined;
  formSet: number | undefined;
}

function toDraft(book: PriceBookRecord | null): Draft {
  const p = book?.prices;
  const fcs = Object.keys(p?.concrete ?? { "4": 0, "5": 0, "6": 0, "8": 0 }).sort((a, b) => Number(a) - Number(b));
  return {
    concrete: fcs.map((k) => ({ fc: Number(k), price: p?.concrete[k], carbon: book?.carbon.concrete[k] })),
    steel: p?.steel,
    steelCarbon: book?.carbon.steel,
    formwork: p?.formwork,
    roundFormwork: p?.roundFormwork,
    brace: p?.brace,
    formSet: book?.formSet ?? 0,
  };
}

export function PriceBookEditor(props: PriceBookEditorProps) {
  return (
    <QueryBoundary>
      <EditorInner {...props} />
    </QueryBoundary>
  );
}

function EditorInner({ projectId }: PriceBookEditorProps) {
  const project = useProject(projectId);
  const history = useQuery({
    queryKey: ["price-books", projectId],
    queryFn: () => callApi<{ priceBook: PriceBookRecord | null; revisions: PriceBookRecord[] }>(`/api/projects/${projectId}/price-book`),
  });
  if (history.isPending || project.isPending) return <p className="text-ink-500">Loading…</p>;
  if (history.isError) return <p role="alert">The price book could not be loaded: {history.error.message}</p>;
  if (project.isError) return <p role="alert">The project could not be loaded: {project.error.message}</p>;
  const latest = history.data.priceBook;
  return (
    <div className="grid gap-6 lg:grid-cols-[3fr_1fr]">
      <BookForm key={latest?.revision ?? 0} projectId={projectId} latest={latest} canEdit={project.data.can.editPriceBook} />
      <aside className="panel text-sm">
        <h2 className="font-semibold">Revisions</h2>
        <ol className="mt-2 space-y-1">
          {history.data.revisions.map((r) => (
            <li key={r.id}>
              Revision {r.revision} · {new Date(r.createdAt).toLocaleString()}
            </li>
          ))}
        </ol>
      </aside>
    </div>
  );
}

function BookForm({ projectId, latest, canEdit }: { projectId: string; latest: PriceBookRecord | null; canEdit: boolean }) {
  const queryClient = useQueryClient();
  const [draft, setDraft] = useState<Draft>(() => toDraft(latest));
  const [saved, setSaved] = useState(false);
  const save = useMutation({
    mutationFn: () => {
      const concrete: Record<string, number> = {};
      const carbonConcrete: Record<string, number> = {};
      for (const row of draft.concrete) {
        if (row.fc === undefined) continue;
        concrete[String(row.fc)] = row.price ?? Number.NaN;
        carbonConcrete[String(row.fc)] = row.carbon ?? Number.NaN;
      }
      return callApi<{ priceBook: PriceBookRecord }>(`/api/projects/${projectId}/price-book`, {
        method: "POST",
        body: {
          baseRevision: latest?.revision ?? 0,
          prices: { concrete, steel: draft.steel, formwork: draft.formwork, roundFormwork: draft.roundFormwork, brace: draft.brace },
          carbon: { concrete: carbonConcrete, steel: draft.steelCarbon },
          formSet: draft.formSet ?? 0,
        },
      });
    },
    onSuccess: async () => {
      setSaved(true);
      await queryClient.invalidateQueries({ queryKey: ["price-books", projectId] });
      await queryClient.invalidateQueries({ queryKey: projectKey(projectId) });
    },
  });
  const errors = issuesByPath(save.error);
  const conflict = save.error instanceof ApiError && save.error.status === 409 ? (save.error.current as PriceBookRecord | null) : null;
  const update = (patch: Partial<Draft>) => {
    setSaved(false);
    setDraft({ ...draft, ...patch });
  };
  const setRow = (i: number, patch: Partial<ConcreteRow>) => update({ concrete: draft.concrete.map((r, j) => (j === i ? { ...r, ...patch } : r)) });

  return (
    <form
      aria-label="Price book"
      className="panel space-y-6"
      onSubmit={(e) => {
        e.preventDefault();
        save.mutate();
      }}
    >
      <p className="text-sm text-ink-500">
        {latest ? `Editing revision ${latest.revision}. Saving writes revision ${latest.revision + 1}; earlier results keep naming the revision they used.` : "No price book yet."}
        {!canEdit ? " Your role reads the price book; owners, engineers and estimators edit it." : ""}
      </p>
      <fieldset disabled={!canEdit} className="space-y-6">
        <div>
          <h2 className="font-semibold">Concrete, in place, by specified strength</h2>
          <table className="mt-2 w-full text-sm">
            <thead>
              <tr className="text-left text-ink-500">
                <th className="font-medium">f′c (ksi)</th>
                <th className="font-medium">Price ($/yd³)</th>
                <th className="font-medium">Carbon (kgCO2e/yd³)</th>
                <th />
              </tr>
            </thead>
            <tbody>
              {draft.concrete.map((row, i) => (
                <tr key={i}>
                  <td className="pr-2">
                    <input aria-label={`f′c of row ${i + 1} (ksi)`} type="number" step="any" className="field-input" value={row.fc ?? ""} onChange={(e) => setRow(i, { fc: e.target.value === "" ? undefined : Number(e.target.value) })} />
                  </td>
                  <td className="pr-2">
                    <input aria-label={`Concrete price for row ${i + 1} ($/yd³)`} type="number" step="any" className="field-input" value={row.price ?? ""} onChange={(e) => setRow(i, { price: e.target.value === "" ? undefined : Number(e.target.value) })} />
                    {row.fc !== undefined && errors[`prices.concrete.${row.fc}`] ? <p className="field-error">{errors[`prices.concrete.${row.fc}`]}</p> : null}
                  </td>
                  <td className="pr-2">
                    <input aria-label={`Concrete carbon for row ${i + 1} (kgCO2e/yd³)`} type="number" step="any" className="field-input" value={row.carbon ?? ""} onChange={(e) => setRow(i, { carbon: e.target.value === "" ? undefined : Number(e.target.value) })} />
                    {row.fc !== undefined && errors[`carbon.concrete.${row.fc}`] ? <p className="field-error">{errors[`carbon.concrete.${row.fc}`]}</p> : null}
                  </td>
                  <td>
                    <button type="button" className="btn-quiet" onClick={() => update({ concrete: draft.concrete.filter((_, j) => j !== i) })} aria-label={`Remove row ${i + 1}`}>
                      Remove
                    </button>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          {errors["prices.concrete"] ? <p className="field-error">{errors["prices.concrete"]}</p> : null}
          <button type="button" className="btn-quiet mt-2" onClick={() => update({ concrete: [...draft.concrete, { fc: undefined, price: undefined, carbon: undefined }] })}>
            Add a strength
          </button>
        </div>
        <div className="grid gap-4 sm:grid-cols-2">
          <NumberField label="Reinforcing steel, placed" unit="$/lb" value={draft.steel} onChange={(v) => update({ steel: v })} error={errors["prices.steel"]} />
          <NumberField label="Reinforcing steel carbon" unit="kgCO2e/lb" value={draft.steelCarbon} onChange={(v) => update({ steelCarbon: v })} error={errors["carbon.steel"]} />
          <NumberField label="Formwork, flat faces (contact area)" unit="$/ft²" value={draft.formwork} onChange={(v) => update({ formwork: v })} error={errors["prices.formwork"]} />
          <NumberField label="Formwork, round (contact area)" unit="$/ft²" value={draft.roundFormwork} onChange={(v) => update({ roundFormwork: v })} error={errors["prices.roundFormwork"]} />
          <NumberField label="Intermediate brace" unit="$ per brace level" value={draft.brace} onChange={(v) => update({ brace: v })} error={errors["prices.brace"]} />
          <NumberField label="Form set (for standardizing sizes)" unit="$ per distinct size" value={draft.formSet} onChange={(v) => update({ formSet: v })} error={errors.formSet} />
        </div>
      </fieldset>
      {conflict ? (
        <div role="alert" className="rounded-md border border-strained-600 p-3 text-sm">
          <p className="font-semibold text-strained-600">Not saved: revision {conflict.revision} was saved by someone else while you edited.</p>
          <p className="mt-1">
            Now: steel {formatNumber(conflict.prices.steel)} $/lb, flat forms {formatNumber(conflict.prices.formwork)} $/ft², round forms {formatNumber(conflict.prices.roundFormwork)} $/ft², brace {formatNumber(conflict.prices.brace)} $; concrete{" "}
            {Object.entries(conflict.prices.concrete)
              .map(([k, v]) => `${k} ksi ${formatNumber(v)} $/yd³`)
              .join(", ")}
            .
          </p>
          <button type="button" className="btn-quiet mt-2" onClick={() => void queryClient.invalidateQueries({ queryKey: ["price-books", projectId] })}>
            Load revision {conflict.revision}
          </button>
        </div>
      ) : save.isError ? (
        <p role="alert" className="field-error">
          {save.error.message}
        </p>
      ) : null}
      {canEdit ? (
        <div className="flex items-center gap-3">
          <button type="submit" className="btn-primary" disabled={save.isPending}>
            {save.isPending ? "Saving…" : "Save as a new revision"}
          </button>
          {saved ? <span className="text-sm text-sound-600">Saved.</span> : null}
        </div>
      ) : null}
    </form>
  );
}
