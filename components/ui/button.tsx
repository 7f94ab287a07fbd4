import Link from "next/link";
import { forwardRef, type ButtonHTMLAttributes, type ComponentProps } from "react";

import { cn } from "./cn";
import { Spinner } from "./spinner";

export type ButtonVariant = "primary" | "secondary" | "ghost" | "danger";
export type ButtonSize = "sm" | "md" | "lg";

// Ember is kept for the one action a page wants taken; the rest stay quiet in moss.
const variantClasses: Record<ButtonVariant, string> = {
  primary:
    "border-ember-600 bg-ember-400 text-bark-900 shadow-card hover:bg-ember-300 active:bg-ember-500",
  secondary: "border-moss-600 bg-paper-50 text-moss-800 hover:bg-moss-50 active:bg-moss-100",
  ghost: "border-transparent bg-transparent text-moss-800 hover:bg-moss-50 active:bg-moss-100",
  danger: "border-berry-700 bg-berry-600 text-paper-50 hover:bg-berry-700 active:bg-berry-800",
};

// md and lg are at least 44 px tall: a comfortable touch target for gloved or shaky hands.
const sizeClasses: Record<ButtonSize, string> = {
  sm: "min-h-9 gap-1.5 px-3 text-sm",
  md: "min-h-11 gap-2 px-4 text-base",
  lg: "min-h-12 gap-2.5 px-6 text-lg",
};

/** The classes of a button, for elements that must look like one (links, summary, label). */
export function getButtonClasses({
  variant = "primary",
  size = "md",
  className,
}: { variant?: ButtonVariant; size?: ButtonSize; className?: string } = {}): string {
  return cn(
    "inline-flex items-center justify-center rounded-lg border font-bold no-underline",
    "transition-colors duration-150 select-none",
    "focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-dusk-500",
    "disabled:cursor-not-allowed disabled:opacity-60 aria-disabled:cursor-not-allowed aria-disabled:opacity-60",
    variantClasses[variant],
    sizeClasses[size],
    className,
  );
}

export type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> & {
  variant?: ButtonVariant;
  size?: ButtonSize;
  /** Shows a spinner, disables the button and marks it busy; the label stays so width holds. */
  loading?: boolean;
};

export const Button = forwardRef<HTMLButtonElement, ButtonProps>(function Button(
  { variant, size, loading = false, disabled, className, children, type = "button", ...rest },
  ref,
) {
  return (
    <button
      ref={ref}
      type={type}
      disabled={disabled || loading}
      aria-busy={loading || undefined}
      className={getButtonClasses({ variant, size, className })}
      {...rest}
    >
      {loading ? <Spinner /> : null}
      {children}
    </button>
  );
});

export type ButtonLinkProps = ComponentProps<typeof Link> & {
  variant?: ButtonVariant;
  size?: ButtonSize;
};

/** A next/link that looks like a button, for actions that are really navigation. */
export function ButtonLink({ variant, size, className, ...rest }: ButtonLinkProps) {
  return <Link className={getButtonClasses({ variant, size, className })} {...rest} />;
}
