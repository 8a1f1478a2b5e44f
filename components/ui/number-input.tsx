import { forwardRef, useId, type InputHTMLAttributes } from "react";
import { cn } from "./cn";
import { controlBox } from "./control-classes";

export type NumberInputProps = Omit<InputHTMLAttributes<HTMLInputElement>, "type" | "inputMode"> & {
  /** The unit as printed beside the figure: "lb", "mm", "%". */
  unit: string;
  /** The unit as spoken, when the short form reads badly aloud ("pounds" for "lb"). */
  unitLabel?: string;
  /** Classes for the outer box, which sets the width; `className` styles the input itself. */
  wrapperClassName?: string;
};

/**
 * A figure with its unit. A text input with a decimal keypad rather than type="number": number inputs
 * change value on a stray scroll, reject a half-typed "3,5" silently and hide what was actually typed.
 */
export const NumberInput = forwardRef<HTMLInputElement, NumberInputProps>(function NumberInput(
  { unit, unitLabel, className, wrapperClassName, disabled, "aria-describedby": describedBy, ...rest },
  ref,
) {
  const unitId = `${useId()}-unit`;
  return (
    <div
      className={cn(
        controlBox,
        "flex h-11 w-full min-w-0 items-center",
        // The ring sits on the whole box so the unit reads as part of the field.
        "has-[input:focus-visible]:border-accent has-[input:focus-visible]:outline-2 has-[input:focus-visible]:outline-offset-1 has-[input:focus-visible]:outline-accent",
        "has-[input[aria-invalid=true]]:border-over has-[input[aria-invalid=true]]:hover:border-over has-[input[aria-invalid=true]:focus-visible]:outline-over",
        // A variant, so it outranks the box's own background instead of racing it in the stylesheet.
        "has-[input:disabled]:cursor-not-allowed has-[input:disabled]:bg-sunken has-[input:disabled]:text-ink-soft",
        wrapperClassName,
      )}
    >
      <input
        ref={ref}
        type="text"
        inputMode="decimal"
        autoComplete="off"
        spellCheck={false}
        disabled={disabled}
        aria-describedby={cn(describedBy, unitId)}
        className={cn(
          "num h-full w-full min-w-0 flex-1 rounded-md bg-transparent pl-3 text-right text-[0.9375rem] tabular-nums",
          "placeholder:text-ink-faint focus-visible:outline-none disabled:cursor-not-allowed",
          className,
        )}
        {...rest}
      />
      <span id={unitId} className="num shrink-0 pr-3 pl-1.5 text-sm text-ink-faint select-none">
        {unitLabel ? (
          <>
            <span aria-hidden="true">{unit}</span>
            <span className="sr-only">{unitLabel}</span>
          </>
        ) : (
          unit
        )}
      </span>
    </div>
  );
});
