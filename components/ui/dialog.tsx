"use client";

import { useEffect, useId, useRef, type KeyboardEvent, type MouseEvent, type PointerEvent, type ReactNode } from "react";
import { X } from "lucide-react";
import { cn } from "./cn";

export type DialogProps = {
  open: boolean;
  /** Asked for by Escape, the close button or a press outside; the parent decides by setting `open`. */
  onClose: () => void;
  title: ReactNode;
  description?: ReactNode;
  children?: ReactNode;
  /** Actions along the bottom edge; put the safe choice first. */
  footer?: ReactNode;
  size?: "sm" | "md" | "lg";
  /** Whether a press on the dimmed page asks to close; off for forms that would lose typed work. */
  closeOnBackdrop?: boolean;
  /** Accessible name of the close button. */
  closeLabel?: string;
  className?: string;
};

const widths = {
  sm: "max-w-sm",
  md: "max-w-lg",
  lg: "max-w-2xl",
} as const;

/**
 * A modal on the platform's `<dialog>`: showModal gives the top layer, the inert page behind and the
 * focus trap for free. The component stays controlled, so the parent's `open` is the only truth.
 */
export function Dialog({
  open,
  onClose,
  title,
  description,
  children,
  footer,
  size = "md",
  closeOnBackdrop = true,
  closeLabel = "Close",
  className,
}: DialogProps) {
  const dialogRef = useRef<HTMLDialogElement>(null);
  const openerRef = useRef<Element | null>(null);
  const openRef = useRef(open);
  const onCloseRef = useRef(onClose);
  const baseId = useId();
  const titleId = `${baseId}-title`;
  const descriptionId = `${baseId}-description`;

  useEffect(() => {
    onCloseRef.current = onClose;
  }, [onClose]);

  useEffect(() => {
    const dialog = dialogRef.current;
    openRef.current = open;
    if (!dialog) return;
    if (open && !dialog.open) {
      openerRef.current = document.activeElement;
      dialog.showModal();
      // Browsers move focus in on their own; this covers the ones that do not.
      if (!dialog.contains(document.activeElement)) {
        const preferred = dialog.querySelector<HTMLElement>("[autofocus]");
        (preferred ?? dialog).focus();
      }
    } else if (!open && dialog.open) {
      dialog.close();
    }
  }, [open]);

  // Hand focus back to whatever opened the dialog once it closes, or if it unmounts while open.
  useEffect(() => {
    if (open) return;
    const opener = openerRef.current;
    openerRef.current = null;
    if (opener instanceof HTMLElement && opener.isConnected) opener.focus();
  }, [open]);

  useEffect(() => {
    const dialog = dialogRef.current;
    return () => {
      if (dialog?.open) dialog.close();
      const opener = openerRef.current;
      if (opener instanceof HTMLElement && opener.isConnected) opener.focus();
    };
  }, []);

  useEffect(() => {
    const dialog = dialogRef.current;
    if (!dialog) return;
    // The platform may close a dialog by itself (a repeated close request, a form with method="dialog");
    // tell the parent so its state follows.
    const handleCancel = (event: Event) => {
      event.preventDefault();
      onCloseRef.current();
    };
    const handleClose = () => {
      // The event arrives a task late; if the dialog is showing again by then (a remount), it is stale.
      if (openRef.current && !dialog.open) onCloseRef.current();
    };
    dialog.addEventListener("cancel", handleCancel);
    dialog.addEventListener("close", handleClose);
    return () => {
      dialog.removeEventListener("cancel", handleCancel);
      dialog.removeEventListener("close", handleClose);
    };
  }, []);

  const handleKeyDown = (event: KeyboardEvent<HTMLDialogElement>) => {
    if (event.key !== "Escape" || event.defaultPrevented) return;
    // Cancelling the key stops the platform's own close, so the parent is asked exactly once.
    event.preventDefault();
    onCloseRef.current();
  };

  // The panel fills the dialog box, so a press whose target is the dialog itself landed on the backdrop.
  // Both ends of the press must be there: selecting text in a field and releasing outside is no request.
  const pressStartedOnBackdrop = useRef(false);
  const handlePointerDown = (event: PointerEvent<HTMLDialogElement>) => {
    pressStartedOnBackdrop.current = event.target === event.currentTarget;
  };
  const handleClick = (event: MouseEvent<HTMLDialogElement>) => {
    const onBackdrop = pressStartedOnBackdrop.current && event.target === event.currentTarget;
    pressStartedOnBackdrop.current = false;
    if (closeOnBackdrop && onBackdrop) onCloseRef.current();
  };

  return (
    <dialog
      ref={dialogRef}
      aria-labelledby={titleId}
      aria-describedby={description ? descriptionId : undefined}
      tabIndex={-1}
      onKeyDown={handleKeyDown}
      onPointerDown={handlePointerDown}
      onClick={handleClick}
      className={cn(
        "m-auto w-[calc(100%-2rem)] max-h-[calc(100dvh-2rem)] overflow-visible border-0 bg-transparent p-0 text-ink",
        "backdrop:bg-black/45 focus-visible:outline-none",
        widths[size],
        className,
      )}
    >
      <div className="relative flex max-h-[calc(100dvh-2rem)] flex-col rounded-card border border-rule bg-panel shadow-card">
        <div className="border-b border-rule py-3.5 pr-14 pl-4 sm:pl-5">
          <h2 id={titleId} className="text-base leading-6 font-semibold">
            {title}
          </h2>
          {description ? (
            <p id={descriptionId} className="mt-0.5 text-sm leading-snug text-ink-soft">
              {description}
            </p>
          ) : null}
        </div>
        {children ? <div className="min-h-0 overflow-y-auto px-4 py-4 sm:px-5">{children}</div> : null}
        {footer ? (
          <div className="flex flex-wrap-reverse justify-end gap-2 border-t border-rule px-4 py-3 sm:px-5">{footer}</div>
        ) : null}
        {/* Last in the tab order so focus lands on the content first; drawn in the top corner. */}
        <button
          type="button"
          onClick={() => onCloseRef.current()}
          aria-label={closeLabel}
          className="absolute top-2 right-2 inline-flex size-10 items-center justify-center rounded-md text-ink-soft hover:bg-sunken hover:text-ink"
        >
          <X aria-hidden="true" className="size-5" />
        </button>
      </div>
    </dialog>
  );
}
