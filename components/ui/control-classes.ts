import { cn } from "./cn";

/**
 * The box shared by text inputs, selects and textareas, so every control in a form has the same height,
 * border, focus ring and error state. The error state keys off aria-invalid, which Field sets.
 */
export const controlBox =
  "rounded-md border border-rule bg-panel text-ink shadow-[inset_0_1px_0_rgb(0_0_0/0.03)] " +
  "transition-colors duration-150 hover:border-ink-faint " +
  "aria-invalid:border-over aria-invalid:hover:border-over " +
  "disabled:cursor-not-allowed disabled:bg-sunken disabled:text-ink-soft";

const focusRing =
  "focus-visible:border-accent focus-visible:outline-2 focus-visible:outline-offset-1 focus-visible:outline-accent " +
  "aria-invalid:focus-visible:outline-over";

export function controlClasses(className?: string): string {
  return cn(
    controlBox,
    focusRing,
    "block w-full min-w-0 px-3 text-[0.9375rem] placeholder:text-ink-faint",
    className,
  );
}
