/**
 * A margin bar: the load as a bar, the limit as a line, on a scale that starts at zero. Decorative beside the
 * figures it repeats, so it is hidden from assistive technology; the status is said in words elsewhere.
 */
import { cn } from "@/components/ui";
import type { CheckStatus, Quantity } from "@/lib/towing";

const tones: Record<CheckStatus, string> = {
  within: "bg-within",
  tight: "bg-tight",
  adjust: "bg-adjust",
  over: "bg-over",
  incomplete: "bg-unknown",
};

export interface MarginBarProps {
  actual?: Quantity;
  limit?: Quantity;
  status: CheckStatus;
  /** A band the load should sit inside (tongue-weight share), in the same unit as `actual`. */
  band?: { min: number; max: number };
  className?: string;
}

export function MarginBar({ actual, limit, status, band, className }: MarginBarProps) {
  if (!actual || !limit) return null;
  const top = Math.max(actual.value, limit.value, band?.max ?? 0) * 1.15;
  if (!(top > 0)) return null;
  const at = (v: number) => `${Math.min(100, Math.max(0, (v / top) * 100))}%`;
  return (
    <div aria-hidden="true" className={cn("relative h-3 w-full rounded-sm bg-sunken", className)}>
      {band ? (
        <div
          className="absolute inset-y-0 border-x border-ink-soft/60 bg-within-soft"
          style={{ left: at(band.min), width: `calc(${at(band.max)} - ${at(band.min)})` }}
        />
      ) : null}
      {band ? (
        <div className={cn("absolute top-1/2 size-3 -translate-x-1/2 -translate-y-1/2 rotate-45 border border-panel", tones[status])} style={{ left: at(actual.value) }} />
      ) : (
        <div className={cn("absolute inset-y-0.5 left-0 rounded-r-sm", tones[status])} style={{ width: at(actual.value) }} />
      )}
      {band ? null : <div className="absolute -inset-y-1 w-0.5 -translate-x-1/2 bg-ink" style={{ left: at(limit.value) }} />}
    </div>
  );
}
