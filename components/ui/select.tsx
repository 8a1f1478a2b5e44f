import { forwardRef, type SelectHTMLAttributes } from "react";
import { ChevronDown } from "lucide-react";
import { cn } from "./cn";
import { controlClasses } from "./control-classes";

export type SelectProps = SelectHTMLAttributes<HTMLSelectElement> & {
  /** Classes for the outer wrapper, which sets the width; `className` styles the select itself. */
  wrapperClassName?: string;
};

/** The platform's own select, so phones show their native picker; only the box is restyled. */
export const Select = forwardRef<HTMLSelectElement, SelectProps>(function Select(
  { className, wrapperClassName, children, multiple, ...rest },
  ref,
) {
  return (
    <div className={cn("relative min-w-0", wrapperClassName)}>
      <select
        ref={ref}
        multiple={multiple}
        className={controlClasses(cn(multiple ? "py-2" : "h-11 appearance-none pr-10", className))}
        {...rest}
      >
        {children}
      </select>
      {multiple ? null : (
        <ChevronDown
          aria-hidden="true"
          className="pointer-events-none absolute top-1/2 right-3 size-4 -translate-y-1/2 text-ink-soft"
        />
      )}
    </div>
  );
});
