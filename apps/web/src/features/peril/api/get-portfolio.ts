import { queryOptions, useQuery } from "@tanstack/react-query";
import { portfolioRecordSchema, type PortfolioRecord } from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { perilRootKey } from "./get-peril-profiles";

export const getPortfolio = (id: string, signal?: AbortSignal) =>
  api.get<PortfolioRecord>(`/api/portfolios/${encodeURIComponent(id)}`, { signal, schema: portfolioRecordSchema });

export const getPortfolioQueryOptions = (id: string) =>
  queryOptions({ queryKey: [...perilRootKey, "portfolio", id], queryFn: ({ signal }) => getPortfolio(id, signal) });

export const usePortfolio = (id: string | undefined) => useQuery({ ...getPortfolioQueryOptions(id ?? ""), enabled: Boolean(id) });
