import { forwardRef, type ButtonHTMLAttributes, type ReactNode } from "react";
import { LoaderCircle } from "lucide-react";
import { cn } from "./cn";

export type ButtonVariant = "primary" | "secondary" | "quiet" | "danger";
export type ButtonSize = "sm" | "md";

export type ButtonClassesOptions = {
  variant?: ButtonVariant;
  size?: ButtonSize;
  className?: string;
};

const base =
  "inline-flex shrink-0 items-center justify-center gap-2 rounded-md border font-medium whitespace-nowrap " +
  "transition-colors duration-150 select-none " +
  "focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-accent " +
  "disabled:cursor-not-allowed disabled:opacity-55 aria-busy:cursor-progress";

const variants: Record<ButtonVariant, string> = {
  primary: "border-accent bg-accent text-on-accent hover:border-accent-strong hover:bg-accent-strong",
  secondary: "border-rule bg-panel text-ink hover:bg-sunken",
  quiet: "border-transparent bg-transparent text-accent-strong hover:bg-accent-soft",
  danger: "border-over bg-over text-on-accent hover:opacity-90",
};

// Both sizes stay at or above 40 px so a gloved thumb at the counter still lands on them.
const sizes: Record<ButtonSize, string> = {
  sm: "h-10 px-3 text-sm [&_svg]:size-4",
  md: "h-11 px-4 text-[0.9375rem] [&_svg]:size-[1.125rem]",
};

/** Button styling for elements that are not buttons, such as a Next `<Link>` that leads somewhere. */
export function buttonClasses({ variant = "primary", size = "md", className }: ButtonClassesOptions = {}): string {
  return cn(base, variants[variant], sizes[size], className);
}

export type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> & {
  variant?: ButtonVariant;
  size?: ButtonSize;
  /** Shows a spinner, marks the button busy and refuses further presses until the work ends. */
  loading?: boolean;
  /** An icon before the label; the spinner takes its place while loading. */
  icon?: ReactNode;
};

export const Button = forwardRef<HTMLButtonElement, ButtonProps>(function Button(
  { variant = "primary", size = "md", loading = false, icon, disabled, className, type = "button", children, ...rest },
  ref,
) {
  return (
    <button
      ref={ref}
      // "button" unless asked: a stray press inside a form must not submit it.
      type={type}
      disabled={disabled || loading}
      aria-busy={loading || undefined}
      className={buttonClasses({ variant, size, className })}
      {...rest}
    >
      {loading ? (
        <LoaderCircle aria-hidden="true" className="animate-spin motion-reduce:animate-none" />
      ) : icon ? (
        <span aria-hidden="true" className="inline-flex">
          {icon}
        </span>
      ) : null}
      {children}
    </button>
  );
});
