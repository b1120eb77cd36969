import type { Response } from "express";

/** Sends a CSV document as a download named `<stem>-<UTC stamp>.csv`. */
export function sendCsv(res: Response, stem: string, csv: string, now = new Date()): void {
  const stamp = now.toISOString().slice(0, 16).replace(/[-:]/g, "").replace("T", "-");
  res.setHeader("content-type", "text/csv; charset=utf-8");
  res.setHeader("content-disposition", `attachment; filename="${stem}-${stamp}Z.csv"`);
  res.send(csv);
}
