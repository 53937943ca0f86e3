import { clsx } from 'clsx'
import type { ButtonHTMLAttributes } from 'react'

const variants = {
  primary: 'bg-tide-700 text-white hover:bg-tide-800 disabled:bg-tide-300',
  secondary: 'bg-white text-tide-800 ring-1 ring-tide-200 hover:bg-tide-50 disabled:text-tide-300',
  danger: 'bg-alarm-600 text-white hover:bg-alarm-700',
  ghost: 'text-tide-700 hover:bg-tide-100',
}

export function Button({ variant = 'primary', className, ...props }: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: keyof typeof variants }) {
  return (
    <button
      className={clsx(
        'inline-flex min-h-11 items-center justify-center gap-2 rounded-lg px-4 font-semibold transition-colors disabled:cursor-not-allowed',
        variants[variant],
        className,
      )}
      {...props}
    />
  )
}
