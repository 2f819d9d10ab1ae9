"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { useSearch } from "@/features/search/api/search";
import { useDebounced } from "@/lib/ui/use-debounced";

/** Header search across customers and machines; Enter opens the full results page. */
export function GlobalSearch() {
  const router = useRouter();
  const [text, setText] = useState("");
  const [open, setOpen] = useState(false);
  const q = useDebounced(text.trim(), 200);
  const search = useSearch(q);
  const id = useId();
  const hits = search.data ? [...search.data.customers, ...search.data.machines] : [];
  return (
    <form
      role="search"
      className="relative"
      onSubmit={(e) => {
        e.preventDefault();
        if (text.trim().length >= 2) {
          setOpen(false);
          router.push(`/search?q=${encodeURIComponent(text.trim())}`);
        }
      }}
    >
      <label htmlFor={id} className="sr-only">
        Search customers and machines
      </label>
      <input
        id={id}
        type="search"
        value={text}
        onChange={(e) => {
          setText(e.target.value);
          setOpen(true);
        }}
        onBlur={(e) => {
          // Keep the list open while focus moves into it.
          const next = e.relatedTarget as Node | null;
          if (!next || !e.currentTarget.form?.contains(next)) setTimeout(() => setOpen(false), 150);
        }}
        onKeyDown={(e) => {
          if (e.key === "Escape") setOpen(false);
          if (e.key === "ArrowDown") {
            // Down arrow moves into the results; Tab and the arrows move between them.
            e.preventDefault();
            document.querySelector<HTMLAnchorElement>(`[id="${id}-results"] a`)?.focus();
          }
        }}
        placeholder="Search customers, machines"
        className="h-9 w-48 rounded-md border border-ink-300 bg-white px-3 text-sm sm:w-64"
        role="combobox"
        aria-autocomplete="list"
        aria-controls={`${id}-results`}
        aria-expanded={open && q.length >= 2}
      />
      {open && q.length >= 2 ? (
        <ul
          id={`${id}-results`}
          onBlur={(e) => {
            const next = e.relatedTarget as Node | null;
            if (!next || !e.currentTarget.parentElement?.contains(next)) setOpen(false);
          }}
          onKeyDown={(e) => {
            const links = [...e.currentTarget.querySelectorAll("a")];
            const at = links.indexOf(document.activeElement as HTMLAnchorElement);
            if (e.key === "ArrowDown") links[Math.min(links.length - 1, at + 1)]?.focus();
            if (e.key === "ArrowUp") links[Math.max(0, at - 1)]?.focus();
            if (e.key === "Escape") setOpen(false);
            if (["ArrowDown", "ArrowUp"].includes(e.key)) e.preventDefault();
          }}
          className="absolute right-0 z-30 mt-1 w-80 overflow-hidden rounded-md border border-ink-200 bg-white shadow-lg"
        >
          {search.isPending ? <li className="px-3 py-2 text-sm text-ink-600">Searching…</li> : null}
          {search.isError ? (
            <li className="px-3 py-2 text-sm text-danger-700">{search.error.message}</li>
          ) : null}
          {search.data && hits.length === 0 ? (
            <li className="px-3 py-2 text-sm text-ink-600">Nothing found</li>
          ) : null}
          {hits.map((h) => (
            <li key={`${h.type}-${h.id}`}>
              <Link
                href={h.href}
                className="block px-3 py-2 hover:bg-furrow-50 focus:bg-furrow-50"
                onClick={() => setOpen(false)}
              >
                <span className="block text-sm font-medium text-ink-900">{h.title}</span>
                <span className="block text-xs text-ink-600">
                  {h.type === "customer" ? "Customer" : "Machine"} · {h.subtitle}
                </span>
              </Link>
            </li>
          ))}
        </ul>
      ) : null}
    </form>
  );
}
