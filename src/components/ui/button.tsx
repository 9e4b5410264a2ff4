// The shared button: primary, secondary, quiet and danger looks, two sizes, and a busy spinner.
import { forwardRef, type ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'secondary' | 'quiet' | 'danger';

const VARIANTS: Record<Variant, string> = {
  primary: 'bg-pine text-white hover:bg-pine-dark disabled:bg-line-strong',
  secondary: 'bg-white text-ink border border-line-strong hover:bg-sand disabled:text-ink-faint',
  quiet: 'text-ink-soft hover:bg-sand hover:text-ink disabled:text-ink-faint',
  danger: 'bg-white text-clay border border-clay/40 hover:bg-clay-wash',
};

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: Variant;
  size?: 'sm' | 'md';
  busy?: boolean;
}

export const Button = forwardRef<HTMLButtonElement, ButtonProps>(function Button(
  { variant = 'secondary', size = 'md', busy = false, className = '', children, disabled, type = 'button', ...rest },
  ref,
) {
  const sizing = size === 'sm' ? 'h-8 px-3 text-sm' : 'h-10 px-4 text-[15px]';
  return (
    <button
      ref={ref}
      type={type}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      className={`inline-flex items-center justify-center gap-2 rounded-lg font-semibold whitespace-nowrap transition-colors disabled:cursor-not-allowed ${sizing} ${VARIANTS[variant]} ${className}`}
      {...rest}
    >
      {busy && <span className="size-3.5 animate-spin rounded-full border-2 border-current border-t-transparent" aria-hidden />}
      {children}
    </button>
  );
});
