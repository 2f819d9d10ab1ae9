import Link from "next/link";
import type { ReactNode } from "react";

export type NavItem = { href: string; label: string };

type AppShellProps = {
  nav: NavItem[];
  /** The signed-in user's menu, or a sign-in link. */
  userMenu: ReactNode;
  children: ReactNode;
};

/** Header with the product name, the main navigation and the user menu; content below. */
export function AppShell({ nav, userMenu, children }: AppShellProps) {
  return (
    <div className="flex min-h-dvh flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-white focus:px-3 focus:py-2"
      >
        Skip to content
      </a>
      <header className="border-b border-ink-200 bg-white">
        <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
          <Link href="/" className="flex items-center gap-2 text-xl font-bold text-furrow-700">
            <TreadMark />
            Treadcast
          </Link>
          <nav
            aria-label="Main"
            className="order-3 -mx-4 w-full overflow-x-auto px-4 sm:order-none sm:mx-0 sm:w-auto sm:px-0"
          >
            <ul className="flex gap-1">
              {nav.map((item) => (
                <li key={item.href}>
                  <Link
                    href={item.href}
                    className="block whitespace-nowrap rounded-md px-3 py-2 text-sm font-medium text-ink-700 hover:bg-furrow-50 hover:text-furrow-800"
                  >
                    {item.label}
                  </Link>
                </li>
              ))}
            </ul>
          </nav>
          <div className="ml-auto">{userMenu}</div>
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-7xl flex-1 px-4 py-6">
        {children}
      </main>
      <footer className="border-t border-ink-200 bg-white px-4 py-3 text-center text-xs text-ink-600">
        Treadcast estimates tyre wear and cost; it does not replace the tyre and machine
        makers&apos; load, pressure and speed data.
      </footer>
    </div>
  );
}

/** The Treadcast mark: a wheel with three lug marks, drawn in our own style. */
function TreadMark() {
  return (
    <svg aria-hidden width="26" height="26" viewBox="0 0 26 26" className="text-furrow-600">
      <circle cx="13" cy="13" r="11" fill="none" stroke="currentColor" strokeWidth="3" />
      <circle cx="13" cy="13" r="3.5" fill="currentColor" />
      <path
        d="M13 2v5M22.5 18.5l-4.3-2.5M3.5 18.5l4.3-2.5"
        stroke="currentColor"
        strokeWidth="2.5"
        strokeLinecap="round"
      />
    </svg>
  );
}
