import { clsx, type ClassValue } from 'clsx';
import { twMerge } from 'tailwind-merge';

/** Joins class names and lets later Tailwind utilities override earlier ones (variants plus a caller's className). */
export function cn(...inputs: ClassValue[]): string {
  return twMerge(clsx(inputs));
}
