import type { ComponentProps } from 'react';
import { controlClass } from './Field';

/** A plain text box; React 19 passes `ref` through as a prop, so react-hook-form's `register` works. */
export function TextInput({ className = '', ...rest }: ComponentProps<'input'>) {
  return <input className={`${controlClass} ${className}`} {...rest} />;
}

export function TextArea({ className = '', ...rest }: ComponentProps<'textarea'>) {
  return <textarea className={`${controlClass} min-h-24 ${className}`} {...rest} />;
}
