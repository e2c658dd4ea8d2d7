import { Link, type LinkProps } from "@/components/ui/link";
import type { AnchorHTMLAttributes, ButtonHTMLAttributes, ReactNode } from "react";
import { cx } from "./cx";
import { Spinner } from "./spinner";

export type ButtonVariant = "primary" | "secondary" | "danger" | "ghost";
export type ButtonSize = "md" | "lg";

type ButtonLook = {
  variant?: ButtonVariant;
  size?: ButtonSize;
  fullWidth?: boolean;
  /** An icon drawn before the words. */
  icon?: ReactNode;
};

const variantClasses: Record<ButtonVariant, string> = {
  primary: "bg-spruce text-white border-2 border-spruce hover:bg-spruce-dark hover:border-spruce-dark active:bg-spruce-dark",
  secondary: "bg-paper-raised text-spruce border-2 border-spruce hover:bg-spruce-light active:bg-spruce-light",
  danger: "bg-over text-white border-2 border-over hover:bg-over-ink hover:border-over-ink active:bg-over-ink",
  ghost: "bg-transparent text-spruce border-2 border-transparent underline-offset-4 hover:bg-spruce-light active:bg-spruce-light",
};

const sizeClasses: Record<ButtonSize, string> = {
  md: "min-h-touch px-4 text-base",
  lg: "min-h-touch-lg px-6 text-lg",
};

/** The classes of a button, for elements that must look like one (a form's submit inside a third-party part). */
export function buttonClasses({ variant = "primary", size = "md", fullWidth = false }: ButtonLook = {}): string {
  return cx(
    "inline-flex items-center justify-center gap-2 rounded-lg font-bold no-underline select-none",
    "transition-colors disabled:cursor-not-allowed disabled:opacity-60 aria-disabled:cursor-not-allowed aria-disabled:opacity-60",
    variantClasses[variant],
    sizeClasses[size],
    fullWidth && "w-full",
  );
}

export type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> &
  ButtonLook & {
    /** Shows a spinner, keeps the button's size and blocks a second press. */
    loading?: boolean;
  };

export function Button({ variant, size, fullWidth, icon, loading = false, className, children, type, disabled, ...rest }: ButtonProps) {
  return (
    <button
      type={type ?? "button"}
      className={cx(buttonClasses({ variant, size, fullWidth }), className)}
      disabled={disabled || loading}
      aria-busy={loading || undefined}
      {...rest}
    >
      {loading ? <Spinner size="sm" label="Working" /> : icon}
      <span>{children}</span>
    </button>
  );
}

export type ButtonLinkProps = Omit<AnchorHTMLAttributes<HTMLAnchorElement>, "href"> &
  ButtonLook & {
    href: LinkProps["href"];
  };

/** A link that looks like a button: for moving to another page, not for doing something. */
export function ButtonLink({ variant, size, fullWidth, icon, className, children, href, ...rest }: ButtonLinkProps) {
  return (
    <Link href={href} className={cx(buttonClasses({ variant, size, fullWidth }), className)} {...rest}>
      {icon}
      <span>{children}</span>
    </Link>
  );
}
