import { formatNumber } from "@/lib/format-units.ts";

/** Forecast hour as staff write it: "F03", "F120"; fractional hours keep their minutes ("F01:30"). */
export function formatForecastHour(hours: number): string {
  if (!Number.isFinite(hours)) return "F—";
  const whole = Math.floor(hours);
  const minutes = Math.round((hours - whole) * 60);
  return `F${String(whole).padStart(2, "0")}${minutes > 0 ? `:${String(minutes).padStart(2, "0")}` : ""}`;
}

/** File sizes in binary multiples, as file managers show them: "812 B", "3.4 MB". */
export function formatFileSize(bytes: number): string {
  if (!Number.isFinite(bytes) || bytes < 0) return "—";
  const units = ["B", "KB", "MB", "GB"];
  let value = bytes;
  let unit = 0;
  while (value >= 1024 && unit < units.length - 1) {
    value /= 1024;
    unit++;
  }
  return `${formatNumber(value, unit === 0 || value >= 100 ? 0 : 1)} ${units[unit]}`;
}
