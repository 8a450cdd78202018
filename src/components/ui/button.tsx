import type { ButtonHTMLAttributes } from 'react';

const variants = {
  primary: 'bg-kiln text-white hover:bg-ink disabled:opacity-60',
  quiet: 'border border-ink-faint text-ink hover:bg-paper-deep disabled:opacity-60',
  danger: 'border border-kiln text-kiln hover:bg-kiln-pale disabled:opacity-60',
} as const;

interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: keyof typeof variants;
}

/** The app's button; `type` defaults to "button" so only real submit buttons submit forms. */
export function Button({ variant = 'primary', className = '', type = 'button', ...props }: ButtonProps) {
  return (
    <button type={type} className={`rounded-md px-4 py-2 font-medium ${variants[variant]} ${className}`} {...props} />
  );
}
