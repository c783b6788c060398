import type { ComponentProps } from 'react';
import { controlClass } from './Field';

export function Select({ className = '', ...rest }: ComponentProps<'select'>) {
  return <select className={`${controlClass} ${className}`} {...rest} />;
}
