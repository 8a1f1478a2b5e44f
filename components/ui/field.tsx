import {
  Children,
  cloneElement,
  forwardRef,
  isValidElement,
  useId,
  type InputHTMLAttributes,
  type ReactElement,
  type ReactNode,
  type TextareaHTMLAttributes,
} from "react";
import { CircleAlert } from "lucide-react";
import { cn } from "./cn";
import { controlClasses } from "./control-classes";

/** What Field hands to its control so the label, help and error are announced with it. */
export type FieldControlProps = {
  id: string;
  "aria-describedby"?: string;
  "aria-invalid"?: true;
  "aria-required"?: true;
};

type FieldChildProps = {
  id?: string;
  "aria-describedby"?: string;
  "aria-invalid"?: boolean | "true" | "false";
  "aria-required"?: boolean | "true" | "false";
};

export type FieldProps = {
  label: ReactNode;
  /** Where the number is found or how to measure it; shown under the label. */
  help?: ReactNode;
  /** A message for the value as it stands; marks the control invalid while present. */
  error?: ReactNode;
  required?: boolean;
  /** Overrides the generated id of the control. */
  id?: string;
  /** Keeps the label for assistive technology only, where the context already names the field. */
  hideLabel?: boolean;
  className?: string;
  /** A single control element, or a function that receives the wiring for a control built inline. */
  children: ReactElement<FieldChildProps> | ((control: FieldControlProps) => ReactNode);
};

function joinIds(...ids: (string | undefined | false)[]): string | undefined {
  const joined = ids.filter(Boolean).join(" ");
  return joined === "" ? undefined : joined;
}

export function Field({ label, help, error, required = false, id, hideLabel = false, className, children }: FieldProps) {
  const generated = useId();
  const child = typeof children === "function" ? null : Children.only(children);
  const controlId = id ?? (child && isValidElement(child) ? child.props.id : undefined) ?? `${generated}-control`;
  const helpId = `${generated}-help`;
  const errorId = `${generated}-error`;
  const hasError = error !== undefined && error !== null && error !== false && error !== "";
  const hasHelp = help !== undefined && help !== null && help !== false && help !== "";

  const control: FieldControlProps = {
    id: controlId,
    // The error comes first: it is what the person needs to hear before the standing help.
    "aria-describedby": joinIds(hasError && errorId, hasHelp && helpId),
    "aria-invalid": hasError ? true : undefined,
    "aria-required": required ? true : undefined,
  };

  let rendered: ReactNode;
  if (typeof children === "function") {
    rendered = children(control);
  } else if (child) {
    rendered = cloneElement(child, {
      ...control,
      "aria-describedby": joinIds(control["aria-describedby"], child.props["aria-describedby"]),
      "aria-invalid": hasError ? true : child.props["aria-invalid"],
      "aria-required": required ? true : child.props["aria-required"],
    });
  }

  return (
    <div className={cn("flex min-w-0 flex-col gap-1.5", className)}>
      <div className={cn("flex items-baseline gap-1", hideLabel && "sr-only")}>
        <label htmlFor={controlId} className="text-sm font-medium text-ink">
          {label}
        </label>
        {/* Outside the label so the field's accessible name stays clean; aria-required carries the meaning. */}
        {required ? (
          <span aria-hidden="true" className="text-sm font-semibold text-over">
            *
          </span>
        ) : null}
      </div>
      {hasHelp ? (
        <div id={helpId} className="text-[0.8125rem] leading-snug text-ink-soft">
          {help}
        </div>
      ) : null}
      {rendered}
      {hasError ? (
        <p id={errorId} className="flex items-start gap-1.5 text-[0.8125rem] leading-snug font-medium text-over">
          <CircleAlert aria-hidden="true" className="mt-px size-4 shrink-0" />
          <span>{error}</span>
        </p>
      ) : null}
    </div>
  );
}

export type TextInputProps = InputHTMLAttributes<HTMLInputElement>;

export const TextInput = forwardRef<HTMLInputElement, TextInputProps>(function TextInput(
  { className, type = "text", ...rest },
  ref,
) {
  return <input ref={ref} type={type} className={controlClasses(cn("h-11", className))} {...rest} />;
});

export type TextareaProps = TextareaHTMLAttributes<HTMLTextAreaElement>;

export const Textarea = forwardRef<HTMLTextAreaElement, TextareaProps>(function Textarea(
  { className, rows = 4, ...rest },
  ref,
) {
  return (
    <textarea ref={ref} rows={rows} className={controlClasses(cn("min-h-24 py-2.5 leading-relaxed", className))} {...rest} />
  );
});
