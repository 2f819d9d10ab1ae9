import type { Metadata } from "next";
import Link from "next/link";
import { headers } from "next/headers";
import { AppShell } from "@/lib/ui/app-shell";
import { ApiGuides } from "@/features/api/components/api-guides";
import { ApiReference } from "@/features/api/components/api-reference";

export const metadata: Metadata = { title: "API reference" };

/** Public: it describes the API, never anyone's data (every API call still needs a token). */
export default async function DevelopersPage() {
  const h = await headers();
  const host = h.get("x-forwarded-host") ?? h.get("host") ?? "localhost:3000";
  const proto = h.get("x-forwarded-proto") ?? (host.startsWith("localhost") ? "http" : "https");
  return (
    <AppShell
      nav={[]}
      userMenu={
        <Link href="/dashboard" className="text-sm font-medium text-furrow-700 hover:underline">
          Back to the workspace
        </Link>
      }
    >
      <div className="mx-auto flex max-w-5xl flex-col gap-8 py-6">
        <header className="flex flex-col gap-2">
          <h1 className="text-3xl font-bold text-ink-900">Treadcast API</h1>
          <p className="max-w-prose text-ink-700">
            Push duty cycles and pull estimates and quote reports from your own systems. The
            machine-readable description is at{" "}
            <a className="text-furrow-700 underline" href="/api/v1/openapi.json">
              /api/v1/openapi.json
            </a>{" "}
            (OpenAPI 3.1).
          </p>
        </header>
        <ApiGuides origin={`${proto}://${host}`} />
        <section aria-labelledby="reference" className="flex flex-col gap-2">
          <h2 id="reference" className="text-xl font-semibold text-ink-900">
            Reference
          </h2>
          <ApiReference url="/api/v1/openapi.json" />
        </section>
      </div>
    </AppShell>
  );
}
