import { useMutation } from "@tanstack/react-query";
import { soundingCsvInput, soundingReportDto } from "@shared/api/soundings.ts";
import { api } from "@/lib/api-client.ts";

/** Diagnoses a sounding CSV on the server and returns everything the page draws (POST /api/soundings/report). */
export async function reportSounding(csv: string) {
  const body = soundingCsvInput.parse({ csv });
  return api.post("/api/soundings/report", body, { schema: soundingReportDto });
}

/** What the user sent, kept with the request so the page can name the source beside its result or error. */
export interface SoundingSubmission {
  csv: string;
  /** "Demo: …", "Pasted text" or the uploaded file's name. */
  label: string;
  origin: "demo" | "paste" | "file";
}

/** A POST that changes nothing on the server, but it is a POST: a mutation, per the client's conventions. */
export function useSoundingReport() {
  return useMutation({ mutationFn: (submission: SoundingSubmission) => reportSounding(submission.csv) });
}
