"use client";
import { useMemo, useState } from "react";
import { useRouter } from "next/navigation";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from "@tanstack/react-table";
import { ROLES, type Role } from "@/lib/permissions";
import { ApiError, fetchJson } from "@/components/providers";
import { FormAlert } from "@/components/auth/form-parts";

export interface Member {
  id: string;
  userId: string;
  email: string;
  name: string;
  role: Role;
  version: number;
  joinedAt: string;
}

export interface MembersTableProps {
  workspaceId: string;
  canManage: boolean;
  meId: string;
}

export const membersQueryKey = (workspaceId: string) => ["workspaces", workspaceId, "members"] as const;

const column = createColumnHelper<Member>();
const dateFormat = new Intl.DateTimeFormat("en", { year: "numeric", month: "short", day: "numeric" });

/** The members of a workspace; owners change roles in place and remove people. */
export function MembersTable({ workspaceId, canManage, meId }: MembersTableProps) {
  const queryClient = useQueryClient();
  const router = useRouter();
  const [sorting, setSorting] = useState<SortingState>([{ id: "name", desc: false }]);
  const [rowErrors, setRowErrors] = useState<Record<string, string>>({});
  const [confirming, setConfirming] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);

  const members = useQuery({
    queryKey: membersQueryKey(workspaceId),
    queryFn: () => fetchJson<{ members: Member[] }>(`/api/workspaces/${workspaceId}/members`).then((r) => r.members),
  });

  const setError = (id: string, message: string | null) =>
    setRowErrors((prev) => {
      const next = { ...prev };
      if (message) next[id] = message;
      else delete next[id];
      return next;
    });

  const changeRole = useMutation({
    mutationFn: (v: { member: Member; role: Role }) =>
      fetchJson(`/api/workspaces/${workspaceId}/members/${v.member.id}`, { method: "PATCH", body: { role: v.role, version: v.member.version } }),
    onMutate: (v) => setError(v.member.id, null),
    onSuccess: (_data, v) => {
      setNotice(`${v.member.name || v.member.email} is now ${v.role}.`);
      if (v.member.userId === meId) router.refresh();
    },
    onError: (error, v) => setError(v.member.id, error instanceof ApiError && error.issues[0] ? error.issues[0].message : (error as Error).message),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ["workspaces", workspaceId] }),
  });

  const remove = useMutation({
    mutationFn: (member: Member) => fetchJson(`/api/workspaces/${workspaceId}/members/${member.id}`, { method: "DELETE" }),
    onSuccess: (_data, member) => {
      setConfirming(null);
      if (member.userId === meId) {
        router.push("/w");
        router.refresh();
        return;
      }
      setNotice(`${member.name || member.email} no longer belongs to the workspace.`);
    },
    onError: (error, member) => {
      setConfirming(null);
      setError(member.id, (error as Error).message);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: ["workspaces", workspaceId] }),
  });

  const columns = useMemo(
    () => [
      column.accessor((m) => m.name || m.email, {
        id: "name",
        header: "Name",
        cell: (info) => (
          <span className="font-medium text-ink-900">
            {info.getValue()}
            {info.row.original.userId === meId ? <span className="ml-2 text-xs font-normal text-ink-500">(you)</span> : null}
          </span>
        ),
      }),
      column.accessor("email", { header: "E-mail", cell: (info) => <span className="text-ink-700">{info.getValue()}</span> }),
      column.accessor("role", {
        header: "Role",
        sortingFn: (a, b) => ROLES.indexOf(a.original.role) - ROLES.indexOf(b.original.role),
        cell: (info) => {
          const member = info.row.original;
          if (!canManage) return <span className="capitalize">{member.role}</span>;
          return (
            <>
              <label htmlFor={`role-${member.id}`} className="sr-only">
                Role of {member.name || member.email}
              </label>
              <select
                id={`role-${member.id}`}
                value={member.role}
                disabled={changeRole.isPending}
                aria-invalid={rowErrors[member.id] ? true : undefined}
                aria-describedby={rowErrors[member.id] ? `row-error-${member.id}` : undefined}
                onChange={(e) => changeRole.mutate({ member, role: e.target.value as Role })}
                className="rounded-md border border-stone-300 bg-white py-1 pl-2 pr-7 text-sm capitalize focus:border-oxide-500 focus:outline-none"
              >
                {ROLES.map((r) => (
                  <option key={r} value={r}>
                    {r}
                  </option>
                ))}
              </select>
            </>
          );
        },
      }),
      column.accessor("joinedAt", { header: "Joined", cell: (info) => dateFormat.format(new Date(info.getValue())) }),
      column.display({
        id: "actions",
        header: () => <span className="sr-only">Actions</span>,
        cell: (info) => {
          const member = info.row.original;
          const self = member.userId === meId;
          if (!canManage && !self) return null;
          const label = self ? "Leave" : "Remove";
          if (confirming === member.id) {
            return (
              <span className="flex flex-wrap items-center justify-end gap-2">
                <span className="text-xs text-ink-500">{self ? "Leave this workspace?" : `Remove ${member.name || member.email}?`}</span>
                <button type="button" className="btn-quiet border-strained-600/50 text-strained-600" onClick={() => remove.mutate(member)} autoFocus>
                  {label}
                </button>
                <button type="button" className="btn-quiet" onClick={() => setConfirming(null)}>
                  Cancel
                </button>
              </span>
            );
          }
          return (
            <button type="button" className="btn-quiet" onClick={() => setConfirming(member.id)} aria-label={`${label} ${member.name || member.email}`}>
              {label}
            </button>
          );
        },
      }),
    ],
    [canManage, meId, changeRole, remove, confirming, rowErrors],
  );

  // TanStack Table returns fresh functions each render; the React Compiler skips this component knowingly.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: members.data ?? [],
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: (m) => m.id,
  });

  if (members.isPending) return <p className="text-sm text-ink-500">Loading members…</p>;
  if (members.isError) return <FormAlert>{members.error.message}</FormAlert>;

  return (
    <div className="space-y-3">
      <div aria-live="polite">{notice ? <FormAlert tone="success">{notice}</FormAlert> : null}</div>
      <div className="overflow-x-auto rounded-lg border border-stone-200 bg-white">
        <table className="min-w-full text-sm">
          <caption className="sr-only">Members of this workspace</caption>
          <thead className="bg-stone-50 text-left text-xs uppercase tracking-wide text-ink-500">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      className="px-4 py-2 font-medium"
                      aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}
                    >
                      {header.column.getCanSort() && header.column.id !== "actions" ? (
                        <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 uppercase hover:text-ink-900">
                          {flexRender(header.column.columnDef.header, header.getContext())}
                          <span aria-hidden>{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : ""}</span>
                        </button>
                      ) : (
                        flexRender(header.column.columnDef.header, header.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody className="divide-y divide-stone-100">
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} data-testid={`member-${row.original.email}`}>
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className={`px-4 py-2.5 align-middle ${cell.column.id === "actions" ? "text-right" : ""}`}>
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    {cell.column.id === "role" && rowErrors[row.id] ? (
                      <p id={`row-error-${row.id}`} role="alert" className="field-error max-w-xs text-xs">
                        {rowErrors[row.id]}
                      </p>
                    ) : null}
                    {cell.column.id === "actions" && rowErrors[row.id] && !canManage ? (
                      <p role="alert" className="field-error text-xs">
                        {rowErrors[row.id]}
                      </p>
                    ) : null}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
