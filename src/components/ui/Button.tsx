import type { ButtonHTMLAttributes, ReactNode } from 'react';
import { Link, type LinkProps } from 'react-router';

export type ButtonVariant = 'primary' | 'secondary' | 'quiet' | 'danger';

const base =
  'inline-flex items-center justify-center gap-2 rounded-sm px-4 py-2 text-sm font-semibold leading-5 ' +
  'border motion-safe:transition-colors disabled:cursor-not-allowed disabled:opacity-55 no-underline print:hidden';

/** The copper accent is for primary actions only; everything else is drawn in ink. */
const variants: Record<ButtonVariant, string> = {
  primary: 'border-copper bg-copper text-white hover:bg-copper-deep hover:border-copper-deep',
  secondary: 'border-ink bg-transparent text-ink hover:bg-paper-sunk',
  quiet: 'border-transparent bg-transparent text-ink underline underline-offset-4 hover:bg-paper-sunk',
  danger: 'border-caution bg-transparent text-caution hover:bg-caution-wash',
};

export function buttonClass(variant: ButtonVariant = 'secondary', extra = '') {
  return `${base} ${variants[variant]} ${extra}`.trim();
}

interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  /** Shows the busy label and disables the button while a request runs. */
  busy?: boolean;
  busyLabel?: ReactNode;
}

export function Button({
  variant = 'secondary',
  busy = false,
  busyLabel,
  className = '',
  type = 'button',
  disabled,
  children,
  ...rest
}: ButtonProps) {
  return (
    <button
      type={type}
      className={buttonClass(variant, className)}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      {...rest}
    >
      {busy && busyLabel ? busyLabel : children}
    </button>
  );
}

/** A link that looks like a button (navigation stays a link for the keyboard and screen readers). */
export function ButtonLink({
  variant = 'secondary',
  className = '',
  ...rest
}: LinkProps & { variant?: ButtonVariant }) {
  return <Link className={buttonClass(variant, className)} {...rest} />;
}
