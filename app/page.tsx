import Link from "next/link";
import { redirect } from "next/navigation";
import { getActor } from "@/features/auth/server/get-actor";
import { AppShell } from "@/lib/ui/app-shell";
import { EstimateSafetyCaution } from "@/lib/ui/caution";

export default async function HomePage() {
  // A signed-in member lands on their work, not on the product page.
  if (await getActor()) redirect("/dashboard");
  return (
    <AppShell
      nav={[]}
      userMenu={
        <Link href="/sign-in" className="text-sm font-medium text-furrow-700 hover:underline">
          Sign in
        </Link>
      }
    >
      <div className="mx-auto flex max-w-3xl flex-col gap-6 py-6">
        <h1 className="text-3xl font-bold text-ink-900">Treadcast</h1>
        <p className="text-lg text-ink-700">
          Quote how long a customer&apos;s tyres will last on their machine, what they cost per
          operating hour, and how much a different steering layout or tyre fitment would save, from
          the customer&apos;s own duty cycle.
        </p>
        <ul className="grid gap-3 sm:grid-cols-3">
          {[
            [
              "Describe the machine",
              "Wheelbase, track, steering layout, loads and tyre fitment per axle.",
            ],
            [
              "Bring the duty cycle",
              "A telematics log or a turn schedule as CSV, or build one from the work done.",
            ],
            [
              "Quote and compare",
              "Hours to replacement and cost per hour per tyre, side by side for each option.",
            ],
          ].map(([title, text]) => (
            <li key={title} className="rounded-lg border border-ink-200 bg-white p-4">
              <p className="font-medium text-furrow-700">{title}</p>
              <p className="mt-1 text-sm text-ink-700">{text}</p>
            </li>
          ))}
        </ul>
        <EstimateSafetyCaution />
      </div>
    </AppShell>
  );
}
