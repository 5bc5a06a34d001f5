import { queryOptions, useQuery } from "@tanstack/react-query";
import { portfolioSummarySchema, type PortfolioSummary } from "@plumeline/contracts";
import { z } from "zod";
import { api } from "@/lib/api-client";
import { perilRootKey } from "./get-peril-profiles";

export const getPortfolios = (signal?: AbortSignal) =>
  api.get<PortfolioSummary[]>("/api/portfolios", { signal, schema: z.array(portfolioSummarySchema) });

export const getPortfoliosQueryOptions = () =>
  queryOptions({ queryKey: [...perilRootKey, "portfolios"], queryFn: ({ signal }) => getPortfolios(signal) });

export const usePortfolios = () => useQuery(getPortfoliosQueryOptions());
