import type { ButtonHTMLAttributes } from 'react';
import { Link, type LinkProps } from 'react-router-dom';

type Variant = 'primary' | 'secondary' | 'ghost' | 'danger';
type Size = 'sm' | 'md';

const variants: Record<Variant, string> = {
  primary:
    'bg-accent text-accent-ink border-transparent hover:brightness-110 disabled:hover:brightness-100',
  secondary: 'bg-raised text-ink border-line hover:border-line-strong',
  ghost: 'bg-transparent text-ink-muted border-transparent hover:bg-raised hover:text-ink',
  // For what takes something away (a ban, a removed link): only on the button that confirms it.
  danger:
    'bg-danger text-canvas border-transparent hover:brightness-110 disabled:hover:brightness-100',
};

const sizes: Record<Size, string> = {
  sm: 'h-7 px-2.5 text-[13px] gap-1.5',
  md: 'h-8.5 px-3.5 text-sm gap-2',
};

export function buttonClass(variant: Variant = 'secondary', size: Size = 'md'): string {
  return [
    'inline-flex items-center justify-center rounded-md border font-medium whitespace-nowrap',
    'transition-[background-color,border-color,filter] duration-100 select-none',
    'disabled:cursor-not-allowed disabled:opacity-55',
    variants[variant],
    sizes[size],
  ].join(' ');
}

type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant; size?: Size };

export function Button({ variant, size, className, type = 'button', ...props }: ButtonProps) {
  return (
    <button type={type} className={`${buttonClass(variant, size)} ${className ?? ''}`} {...props} />
  );
}

type LinkButtonProps = LinkProps & { variant?: Variant; size?: Size };

export function LinkButton({ variant, size, className, ...props }: LinkButtonProps) {
  return <Link className={`${buttonClass(variant, size)} ${className ?? ''}`} {...props} />;
}
