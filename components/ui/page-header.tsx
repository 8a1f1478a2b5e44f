import type { ReactNode } from "react";
import { cn } from "./cn";

export type PageHeaderProps = {
  title: ReactNode;
  description?: ReactNode;
  /** Page-level actions; they drop under the title on a phone. */
  actions?: ReactNode;
  /** A small line above the title, such as the section the page belongs to. */
  eyebrow?: ReactNode;
  className?: string;
};

export function PageHeader({ title, description, actions, eyebrow, className }: PageHeaderProps) {
  return (
    <header
      className={cn(
        "flex flex-col gap-3 border-b border-rule pb-4 sm:flex-row sm:items-end sm:justify-between sm:gap-6",
        className,
      )}
    >
      <div className="min-w-0">
        {eyebrow ? <p className="mb-1 text-xs font-semibold tracking-wide text-ink-soft uppercase">{eyebrow}</p> : null}
        <h1 className="text-2xl leading-tight font-semibold tracking-tight text-balance text-ink">{title}</h1>
        {description ? <p className="mt-1.5 max-w-prose text-[0.9375rem] leading-relaxed text-ink-soft">{description}</p> : null}
      </div>
      {actions ? <div className="flex shrink-0 flex-wrap items-center gap-2">{actions}</div> : null}
    </header>
  );
}
