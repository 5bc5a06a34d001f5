import { useMutation, useQueryClient } from "@tanstack/react-query";
import { pathwayPreviewSchema, pathwaySchema, type Pathway, type PathwayPreview } from "@plumeline/contracts";
import { api } from "@/lib/api-client";
import { pathwaysListKey } from "./get-pathways";

export interface PathwayUploadInput {
  file: File;
  name: string;
  source: string;
  vintage: string;
  description?: string;
}

function toForm(input: PathwayUploadInput, preview: boolean): FormData {
  const form = new FormData();
  form.set("name", input.name);
  form.set("source", input.source);
  form.set("vintage", input.vintage);
  form.set("description", input.description ?? "");
  if (preview) form.set("preview", "true");
  form.set("file", input.file);
  return form;
}

/** Parses the file on the server without saving anything: rows, agents and any row/column errors. */
export const previewPathwayUpload = (input: PathwayUploadInput) =>
  api.post<PathwayPreview>("/api/pathways/upload", toForm(input, true), { schema: pathwayPreviewSchema });

export const uploadPathway = (input: PathwayUploadInput) =>
  api.post<Pathway>("/api/pathways/upload", toForm(input, false), { schema: pathwaySchema });

export const usePreviewPathwayUpload = () => useMutation({ mutationFn: previewPathwayUpload });

export function useUploadPathway() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadPathway,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: pathwaysListKey }),
  });
}
