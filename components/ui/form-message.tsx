import type { ReactNode } from "react";
import { CircleAlert, CircleCheck } from "lucide-react";
import { cn } from "./cn";

export type FormMessageTone = "success" | "error";

export type FormMessageProps = {
  tone?: FormMessageTone;
  /** The message; when empty the region stays in place, invisible, ready to announce the next one. */
  children?: ReactNode;
  id?: string;
  className?: string;
};

const tones: Record<FormMessageTone, { icon: typeof CircleCheck; box: string; iconClass: string }> = {
  success: { icon: CircleCheck, box: "border-within/35 bg-within-soft", iconClass: "text-within" },
  error: { icon: CircleAlert, box: "border-over/45 bg-over-soft", iconClass: "text-over" },
};

/**
 * A form's overall outcome after a submit ("Saved", "3 fields need a look"). The region is rendered even when
 * empty because screen readers only announce changes inside a live region that already exists.
 */
export function FormMessage({ tone = "error", children, id, className }: FormMessageProps) {
  const hasMessage = children !== undefined && children !== null && children !== false && children !== "";
  const { icon: Icon, box, iconClass } = tones[tone];
  return (
    <div id={id} role="status" aria-live="polite" aria-atomic="true" className={cn(!hasMessage && "contents", className)}>
      {hasMessage ? (
        <div className={cn("flex items-start gap-2.5 rounded-md border px-3 py-2.5 text-sm leading-snug text-ink", box)}>
          <Icon aria-hidden="true" className={cn("mt-px size-[1.125rem] shrink-0", iconClass)} />
          <div className="min-w-0 flex-1">{children}</div>
        </div>
      ) : null}
    </div>
  );
}
