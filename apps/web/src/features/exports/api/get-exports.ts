import { queryOptions, useQuery } from "@tanstack/react-query";
import { exportRecordSchema, type ExportRecord } from "@plumeline/contracts";
import { z } from "zod";
import { api } from "@/lib/api-client";

export const exportsRootKey = ["exports"] as const;

export const getExports = (mine: boolean, signal?: AbortSignal) =>
  api.get<ExportRecord[]>("/api/exports", { query: { mine: mine ? "true" : undefined }, signal, schema: z.array(exportRecordSchema) });

export const getExportsQueryOptions = (mine = false) =>
  queryOptions({ queryKey: [...exportsRootKey, "list", { mine }], queryFn: ({ signal }) => getExports(mine, signal) });

export const useExports = (mine = false) => useQuery(getExportsQueryOptions(mine));
