import "server-only";
import type { TPage } from "@/features/workspace/schemas/list-query";

export function toPage<T>(items: T[], total: number, page: number, pageSize: number): TPage<T> {
  return { items, page, pageSize, total, pageCount: Math.max(1, Math.ceil(total / pageSize)) };
}

/** Escapes LIKE wildcards so a user's "50%" searches for the text "50%". */
export function likePattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

export const iso = (d: Date) => d.toISOString();
