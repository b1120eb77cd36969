/**
 * A thin determinate progress bar with its percentage beside it. `value` is a fraction 0..1;
 * `label` names what is progressing for screen readers ("Ingest of gfs_f03.grib2").
 */
export function ProgressBar({ value, label, className = "" }: { value: number; label: string; className?: string }) {
  const fraction = Number.isFinite(value) ? Math.min(1, Math.max(0, value)) : 0;
  const percent = Math.round(fraction * 100);
  return (
    <div className={`flex items-center gap-2 ${className}`}>
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        className="h-1.5 min-w-16 flex-1 overflow-hidden rounded-full bg-raised"
      >
        <div className="h-full rounded-full bg-accent transition-[width] duration-300" style={{ width: `${percent}%` }} />
      </div>
      <span className="w-9 text-right font-mono text-xs text-muted tabular-nums">{percent} %</span>
    </div>
  );
}
