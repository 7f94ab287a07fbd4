"use client";

import { useEffect, useId, useRef, type MouseEvent, type ReactNode } from "react";

import { Button } from "./button";
import { cn } from "./cn";

type DialogSize = "sm" | "md" | "lg";

const sizeClasses: Record<DialogSize, string> = {
  sm: "max-w-sm",
  md: "max-w-lg",
  lg: "max-w-2xl",
};

export type DialogProps = {
  open: boolean;
  /** Called when the reader dismisses the dialog: Escape, the close button or the backdrop. */
  onClose: () => void;
  title: ReactNode;
  description?: ReactNode;
  children?: ReactNode;
  /** Buttons, right-aligned at the bottom (stacked on phones). */
  footer?: ReactNode;
  size?: DialogSize;
  /** false while an action runs: Escape, backdrop and the close button are ignored. */
  dismissible?: boolean;
};

/**
 * A modal on the native <dialog>: showModal() makes the rest of the page inert, keeps focus
 * inside, closes on Escape and returns focus to the opener, so no focus-trap code is needed.
 */
export function Dialog({
  open,
  onClose,
  title,
  description,
  children,
  footer,
  size = "md",
  dismissible = true,
}: DialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  // Set while the parent closes the dialog through `open`, so that close is not reported back
  // as if the reader had dismissed it (a confirmed ConfirmDialog must not also "cancel").
  const closingFromProp = useRef(false);
  const titleId = useId();
  const descriptionId = useId();

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) {
      closingFromProp.current = true;
      dialog.close();
    }
  }, [open]);

  function handleClose() {
    if (closingFromProp.current) {
      closingFromProp.current = false;
      return;
    }
    onClose();
  }

  function handleClick(event: MouseEvent<HTMLDialogElement>) {
    // The inner panel fills the dialog box, so a click whose target is the dialog itself
    // landed on the backdrop.
    if (dismissible && event.target === event.currentTarget) ref.current?.close();
  }

  return (
    <dialog
      ref={ref}
      onClose={handleClose}
      onCancel={(event) => {
        if (!dismissible) event.preventDefault();
      }}
      onClick={handleClick}
      aria-labelledby={titleId}
      aria-describedby={description ? descriptionId : undefined}
      className={cn(
        "m-auto w-[calc(100%-2rem)] rounded-2xl border border-paper-300 bg-paper-50 p-0 text-ink shadow-lift",
        "max-h-[calc(100dvh-2rem)] open:animate-rise-in",
        sizeClasses[size],
      )}
    >
      <div className="relative flex flex-col gap-4 p-5 sm:p-6">
        <div className="flex flex-col gap-1.5 pr-10">
          <h2 id={titleId} className="text-xl">
            {title}
          </h2>
          {description ? (
            <p id={descriptionId} className="text-ink-soft">
              {description}
            </p>
          ) : null}
        </div>
        {children}
        {footer ? (
          <div className="flex flex-col-reverse gap-2 pt-2 sm:flex-row sm:justify-end">
            {footer}
          </div>
        ) : null}
        {/* Last in the DOM so showModal() focuses the first field or button, not this. */}
        <button
          type="button"
          onClick={() => ref.current?.close()}
          disabled={!dismissible}
          aria-label="Close"
          className="absolute top-3 right-3 rounded-lg p-2 text-ink-soft hover:bg-paper-200 hover:text-ink focus-visible:outline-3 focus-visible:outline-dusk-500 disabled:opacity-50 sm:top-4 sm:right-4"
        >
          <svg viewBox="0 0 20 20" aria-hidden="true" className="size-5 fill-current">
            <path d="M5.7 4.3 10 8.6l4.3-4.3 1.4 1.4L11.4 10l4.3 4.3-1.4 1.4L10 11.4l-4.3 4.3-1.4-1.4L8.6 10 4.3 5.7z" />
          </svg>
        </button>
      </div>
    </dialog>
  );
}

export type ConfirmDialogProps = {
  open: boolean;
  title: ReactNode;
  /** What will happen, in plain words ("The order's payment will be refunded in full."). */
  children: ReactNode;
  confirmLabel: string;
  cancelLabel?: string;
  /** "danger" for destructive actions (delete, refund, cancel order). */
  tone?: "danger" | "primary";
  /** Shows the confirm button busy while the action runs. */
  pending?: boolean;
  onConfirm: () => void;
  onCancel: () => void;
};

/**
 * Asks before an action that cannot be undone. The cancel button takes focus first so an
 * accidental Enter does nothing harmful.
 */
export function ConfirmDialog({
  open,
  title,
  children,
  confirmLabel,
  cancelLabel = "Cancel",
  tone = "danger",
  pending = false,
  onConfirm,
  onCancel,
}: ConfirmDialogProps) {
  return (
    <Dialog
      open={open}
      onClose={onCancel}
      title={title}
      size="sm"
      dismissible={!pending}
      footer={
        <>
          <Button variant="secondary" autoFocus onClick={onCancel} disabled={pending}>
            {cancelLabel}
          </Button>
          <Button variant={tone} onClick={onConfirm} loading={pending}>
            {confirmLabel}
          </Button>
        </>
      }
    >
      <div className="text-ink">{children}</div>
    </Dialog>
  );
}
