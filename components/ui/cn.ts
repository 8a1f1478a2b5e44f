import { clsx, type ClassValue } from "clsx";

/** Joins class names; a thin alias so every building block composes classes the same way. */
export function cn(...values: ClassValue[]): string {
  return clsx(values);
}
