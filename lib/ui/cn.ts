import { clsx, type ClassValue } from "clsx";
import { twMerge } from "tailwind-merge";

/** Joins conditional class names; a later Tailwind class wins over a conflicting earlier one (w-40 over w-full). */
export function cn(...values: ClassValue[]): string {
  return twMerge(clsx(values));
}
