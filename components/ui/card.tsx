import type { HTMLAttributes, ReactNode } from "react";
import { cn } from "./cn";

export type CardProps = HTMLAttributes<HTMLElement> & {
  /** `section` when the card is a titled region of the page (pair it with aria-labelledby). */
  as?: "div" | "section" | "article";
};

export function Card({ as: Element = "div", className, ...rest }: CardProps) {
  return (
    <Element
      className={cn("min-w-0 rounded-card border border-rule bg-panel text-ink shadow-card", className)}
      {...rest}
    />
  );
}

export type CardHeaderProps = Omit<HTMLAttributes<HTMLDivElement>, "title"> & {
  title: ReactNode;
  description?: ReactNode;
  /** Buttons or links at the trailing edge; they wrap under the title on a narrow screen. */
  actions?: ReactNode;
  /** Heading level, so a card sits correctly in the page outline. */
  titleAs?: "h2" | "h3" | "h4";
  titleId?: string;
};

export function CardHeader({
  title,
  description,
  actions,
  titleAs: Heading = "h2",
  titleId,
  className,
  children,
  ...rest
}: CardHeaderProps) {
  return (
    <div
      className={cn("flex flex-wrap items-start justify-between gap-x-4 gap-y-2 border-b border-rule px-4 py-3 sm:px-5", className)}
      {...rest}
    >
      <div className="min-w-0 flex-1">
        <Heading id={titleId} className="text-base leading-6 font-semibold text-ink">
          {title}
        </Heading>
        {description ? <p className="mt-0.5 text-sm leading-snug text-ink-soft">{description}</p> : null}
        {children}
      </div>
      {actions ? <div className="flex shrink-0 flex-wrap items-center gap-2">{actions}</div> : null}
    </div>
  );
}

export type CardBodyProps = HTMLAttributes<HTMLDivElement>;

export function CardBody({ className, ...rest }: CardBodyProps) {
  return <div className={cn("px-4 py-4 sm:px-5", className)} {...rest} />;
}
