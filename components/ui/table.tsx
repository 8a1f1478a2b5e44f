import {
  useId,
  type HTMLAttributes,
  type ReactNode,
  type TdHTMLAttributes,
  type ThHTMLAttributes,
} from "react";
import { ChevronDown, ChevronUp, ChevronsUpDown } from "lucide-react";
import { cn } from "./cn";

export type TableProps = HTMLAttributes<HTMLTableElement> & {
  /** Names the table; with it the scrolling wrapper becomes a labelled region reachable by keyboard. */
  caption?: ReactNode;
  /** Keeps the caption for assistive technology only. */
  hideCaption?: boolean;
  wrapperClassName?: string;
};

/**
 * A table inside a wrapper that scrolls sideways, so a wide comparison stays readable at 375 px instead of
 * squeezing figures onto two lines.
 */
export function Table({ caption, hideCaption = false, wrapperClassName, className, children, ...rest }: TableProps) {
  const captionId = `${useId()}-caption`;
  const named = caption !== undefined && caption !== null && caption !== false;
  return (
    <div
      className={cn("w-full overflow-x-auto rounded-md border border-rule bg-panel", wrapperClassName)}
      // A scrollable box has to be focusable for keyboard users to scroll it; only worth it when it has a name.
      {...(named ? { role: "region", "aria-labelledby": captionId, tabIndex: 0 } : {})}
    >
      <table className={cn("w-full border-collapse text-left text-sm text-ink", className)} {...rest}>
        {named ? (
          <caption
            id={captionId}
            className={cn(
              hideCaption ? "sr-only" : "border-b border-rule px-3 py-2.5 text-left text-sm font-semibold text-ink",
            )}
          >
            {caption}
          </caption>
        ) : null}
        {children}
      </table>
    </div>
  );
}

export type THeadProps = HTMLAttributes<HTMLTableSectionElement>;

export function THead({ className, ...rest }: THeadProps) {
  return <thead className={cn("border-b border-rule bg-sunken", className)} {...rest} />;
}

export type TBodyProps = HTMLAttributes<HTMLTableSectionElement>;

export function TBody({ className, ...rest }: TBodyProps) {
  return <tbody className={cn("divide-y divide-rule", className)} {...rest} />;
}

export type TRProps = HTMLAttributes<HTMLTableRowElement>;

export function TR({ className, ...rest }: TRProps) {
  return <tr className={cn("align-top", className)} {...rest} />;
}

export type SortDirection = "ascending" | "descending" | "none";

export type THProps = ThHTMLAttributes<HTMLTableCellElement> & {
  /** Right-aligns the heading over a column of figures. */
  numeric?: boolean;
  /** The column's sort state; setting it (even "none") marks the column as sortable. */
  sort?: SortDirection;
  /** Called when the heading is pressed; makes the heading a button. */
  onSort?: () => void;
};

const sortIcons = {
  ascending: ChevronUp,
  descending: ChevronDown,
  none: ChevronsUpDown,
} as const;

export function TH({ numeric = false, sort, onSort, scope = "col", className, children, ...rest }: THProps) {
  const sortable = sort !== undefined || onSort !== undefined;
  const SortIcon = sortIcons[sort ?? "none"];
  const indicator = sortable ? (
    <SortIcon aria-hidden="true" className={cn("size-3.5 shrink-0", sort === "none" || !sort ? "text-ink-faint" : "text-ink")} />
  ) : null;

  return (
    <th
      scope={scope}
      aria-sort={sortable ? (sort ?? "none") : undefined}
      className={cn(
        "px-3 py-2.5 text-xs font-semibold tracking-wide whitespace-nowrap text-ink-soft uppercase",
        numeric && "text-right",
        className,
      )}
      {...rest}
    >
      {onSort ? (
        <button
          type="button"
          onClick={onSort}
          className={cn(
            "-mx-1.5 inline-flex min-h-8 items-center gap-1 rounded px-1.5 font-semibold tracking-wide uppercase hover:bg-panel hover:text-ink",
            numeric && "flex-row-reverse",
          )}
        >
          <span>{children}</span>
          {indicator}
        </button>
      ) : (
        <span className={cn("inline-flex items-center gap-1", numeric && "flex-row-reverse")}>
          <span>{children}</span>
          {indicator}
        </span>
      )}
    </th>
  );
}

export type TDProps = TdHTMLAttributes<HTMLTableCellElement> & {
  /** Right-aligns with tabular figures so digits line up down the column. */
  numeric?: boolean;
};

export function TD({ numeric = false, className, ...rest }: TDProps) {
  return (
    <td
      className={cn("px-3 py-2.5 text-ink", numeric && "num text-right whitespace-nowrap tabular-nums", className)}
      {...rest}
    />
  );
}

export type EmptyRowProps = {
  /** How many columns the message spans: the number of headings. */
  colSpan: number;
  children: ReactNode;
  className?: string;
};

/** The row shown when a list has nothing in it yet; the message should say what to do next. */
export function EmptyRow({ colSpan, children, className }: EmptyRowProps) {
  return (
    <tr>
      <td colSpan={colSpan} className={cn("px-3 py-8 text-center text-sm text-ink-soft", className)}>
        {children}
      </td>
    </tr>
  );
}
