import type { HTMLAttributes } from "react";
import { CircleCheck, OctagonX, SquareDashed, TriangleAlert, Wrench, type LucideIcon } from "lucide-react";
import { cn } from "./cn";
import { STATUS_MEANING } from "@/lib/glossary";

export type VerdictStatus = "within" | "tight" | "adjust" | "over" | "incomplete";
export type VerdictBadgeSize = "sm" | "md" | "lg";

/** The words for each status; screens that need other wording pass `label`. */
export const verdictWords: Record<VerdictStatus, string> = {
  within: "Within",
  tight: "Tight",
  adjust: "Adjust the set-up",
  over: "Over",
  incomplete: "Not enough data",
};

/** The words for a whole rig's level: "incomplete" there means the rig cannot be confirmed yet. */
export const levelWords: Record<VerdictStatus, string> = {
  within: "Within",
  tight: "Tight",
  adjust: "Adjust the set-up",
  over: "Over: do not tow",
  incomplete: "Not confirmed",
};

/** What each level means, in a sentence anyone can read: the glossary's words, one source for every screen. */
export const levelMeaning: Record<VerdictStatus, string> = {
  within: STATUS_MEANING.within.verdict,
  tight: STATUS_MEANING.tight.verdict,
  adjust: STATUS_MEANING.adjust.verdict,
  over: STATUS_MEANING.over.verdict,
  incomplete: STATUS_MEANING.incomplete.verdict,
};

// Each status has its own outline (round, three-sided, a spanner, eight-sided, broken) so a greyscale printout
// or a colour-blind reader still tells them apart without the tone.
const statuses: Record<VerdictStatus, { icon: LucideIcon; tone: string }> = {
  within: { icon: CircleCheck, tone: "border-within/35 bg-within-soft text-within" },
  tight: { icon: TriangleAlert, tone: "border-tight/40 bg-tight-soft text-tight" },
  adjust: { icon: Wrench, tone: "border-double border-[3px] border-adjust/45 bg-adjust-soft text-adjust" },
  over: { icon: OctagonX, tone: "border-over/50 bg-over-soft text-over" },
  incomplete: { icon: SquareDashed, tone: "border-dashed border-unknown/50 bg-unknown-soft text-unknown" },
};

const sizes: Record<VerdictBadgeSize, { box: string; icon: string }> = {
  sm: { box: "h-6 gap-1 px-2 text-xs", icon: "size-3.5" },
  md: { box: "h-7 gap-1.5 px-2.5 text-sm", icon: "size-4" },
  lg: { box: "h-9 gap-2 px-3 text-base", icon: "size-5" },
};

export type VerdictBadgeProps = Omit<HTMLAttributes<HTMLSpanElement>, "children"> & {
  status: VerdictStatus;
  /** Replaces the standard word, e.g. "Over by 300 lb". */
  label?: string;
  size?: VerdictBadgeSize;
};

export function VerdictBadge({ status, label, size = "md", className, ...rest }: VerdictBadgeProps) {
  const { icon: Icon, tone } = statuses[status];
  const { box, icon } = sizes[size];
  return (
    <span
      data-status={status}
      className={cn(
        "inline-flex shrink-0 items-center rounded-md border leading-none font-semibold whitespace-nowrap",
        tone,
        box,
        className,
      )}
      {...rest}
    >
      <Icon aria-hidden="true" strokeWidth={2.25} className={cn("shrink-0", icon)} />
      <span>{label ?? verdictWords[status]}</span>
    </span>
  );
}
