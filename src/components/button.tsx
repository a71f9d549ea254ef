import type { ButtonHTMLAttributes, Ref } from 'react';
import { cn } from '../lib/cn.ts';

type Variant = 'primary' | 'secondary' | 'quiet' | 'danger' | 'inverse';
type Size = 'md' | 'sm';

const base =
  'inline-flex items-center justify-center gap-2 rounded font-sans font-semibold ' +
  'transition-colors disabled:cursor-not-allowed disabled:opacity-60 whitespace-nowrap';

const variants: Record<Variant, string> = {
  primary: 'bg-signal text-white border border-signal hover:bg-signal-strong hover:border-signal-strong',
  secondary: 'bg-paper-raised text-ink border border-control hover:bg-paper-sunk',
  quiet: 'bg-transparent text-signal border border-transparent underline underline-offset-4 hover:text-signal-strong',
  danger: 'bg-paper-raised text-danger border border-danger hover:bg-danger-tint',
  /** On the dark (ink) lab header. */
  inverse: 'bg-transparent text-paper border border-paper hover:bg-ink-soft',
};

const sizes: Record<Size, string> = {
  md: 'min-h-11 px-4 text-sm',
  sm: 'min-h-9 px-3 text-xs',
};

export function buttonClasses(variant: Variant = 'primary', size: Size = 'md', className?: string) {
  return cn(base, variants[variant], sizes[size], className);
}

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: Variant;
  size?: Size;
  /** Shows a busy state and blocks further clicks; the label stays readable. */
  pending?: boolean;
  ref?: Ref<HTMLButtonElement>;
}

export function Button({
  variant = 'primary',
  size = 'md',
  pending = false,
  type = 'button',
  className,
  disabled,
  children,
  ...rest
}: ButtonProps) {
  return (
    <button
      type={type}
      className={buttonClasses(variant, size, className)}
      disabled={disabled || pending}
      aria-busy={pending || undefined}
      {...rest}
    >
      {pending ? (
        <span
          aria-hidden="true"
          className="inline-block size-3.5 animate-spin rounded-full border-2 border-current border-r-transparent"
        />
      ) : null}
      {children}
    </button>
  );
}
