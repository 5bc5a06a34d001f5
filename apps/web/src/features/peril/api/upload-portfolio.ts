import { useMutation, useQueryClient } from "@tanstack/react-query";
import { portfolioPreviewSchema, portfolioRecordSchema, type PortfolioPreview, type PortfolioRecord } from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { perilRootKey } from "./get-peril-profiles";

export interface PortfolioUploadInput {
  file: File;
  name: string;
  description?: string;
}

function toForm(input: PortfolioUploadInput, preview: boolean): FormData {
  const form = new FormData();
  form.set("name", input.name);
  form.set("description", input.description ?? "");
  if (preview) form.set("preview", "true");
  form.set("file", input.file);
  return form;
}

/** Parses the file on the server without saving: every row, the currencies and the checksum, or row/column errors. */
export const previewPortfolioUpload = (input: PortfolioUploadInput) =>
  api.post<PortfolioPreview>("/api/portfolios/upload", toForm(input, true), { schema: portfolioPreviewSchema });

export const uploadPortfolio = (input: PortfolioUploadInput) =>
  api.post<PortfolioRecord>("/api/portfolios/upload", toForm(input, false), { schema: portfolioRecordSchema });

export const usePreviewPortfolioUpload = () => useMutation({ mutationFn: previewPortfolioUpload });

export function useUploadPortfolio() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: uploadPortfolio, onSuccess: () => queryClient.invalidateQueries({ queryKey: perilRootKey }) });
}
