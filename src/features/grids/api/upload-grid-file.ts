import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { ingestJobDto } from "@shared/api/grids.ts";
import { api } from "@/lib/api-client.ts";
import { gridKeys } from "./grid-keys.ts";

const uploadReply = z.object({ job: ingestJobDto, duplicate: z.boolean() });
export type UploadReply = z.infer<typeof uploadReply>;

/** Sends one grid file as multipart field "file"; the server decides its type from its first bytes. */
export async function uploadGridFile(file: File): Promise<UploadReply> {
  const form = new FormData();
  form.append("file", file, file.name);
  return api.post("/api/grids", form, { schema: uploadReply });
}

export function useUploadGridFile() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadGridFile,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: gridKeys.jobs() }),
  });
}
