"use client";
import { useQuery } from "@tanstack/react-query";
import { callApi } from "./api";
import type { UnitSystem } from "./units";

export interface ProjectRecord {
  id: string;
  workspaceId: string;
  name: string;
  codeBasis: string;
  units: UnitSystem;
  exposure: "interior" | "exposed" | "earth";
  cover: number;
  eiOption: "a" | "b" | "c";
  dagg: number;
  notes: string;
  version: number;
  updatedAt: string;
}

export interface PriceBookRecord {
  id: string;
  revision: number;
  prices: { concrete: Record<string, number>; steel: number; formwork: number; roundFormwork: number; brace: number };
  carbon: { concrete: Record<string, number>; steel: number };
  formSet: number;
  createdAt: string;
}

export interface ProjectResponse {
  project: ProjectRecord;
  priceBook: PriceBookRecord | null;
  role: string;
  can: { editProject: boolean; editMarks: boolean; editLoads: boolean; editPriceBook: boolean; deleteProject: boolean };
}

export const projectKey = (projectId: string) => ["project", projectId] as const;

export function useProject(projectId: string) {
  return useQuery({ queryKey: projectKey(projectId), queryFn: () => callApi<ProjectResponse>(`/api/projects/${projectId}`) });
}
