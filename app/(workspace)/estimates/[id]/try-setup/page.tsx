import Link from "next/link";
import { loadSetupPage } from "@/features/options/server/load-setup-page";
import { SetupForm } from "@/features/options/components/setup-form";
import { formatMoney } from "@/lib/format/format";
import { EstimateSafetyCaution } from "@/lib/ui/caution";

export const metadata = { title: "Try another setup" };

export default async function TrySetupPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { actor, base } = await loadSetupPage(id);
  return (
    <div className="flex flex-col gap-4">
      <div>
        <h1 className="text-2xl font-bold text-ink-900">Try another setup</h1>
        <p className="text-ink-700">
          {base.machineName} on{" "}
          <Link href={`/estimates/${id}`} className="text-furrow-700 hover:underline">
            {base.estimateTitle}
          </Link>
          ; today {formatMoney(base.costPerHour, actor.currency)} per operating hour. Each option is
          one or more changes to today&apos;s machine; only changes that fit its steering and drive
          are offered. To chart one setting over a range instead,{" "}
          <Link href={`/estimates/${id}/sweep`} className="text-furrow-700 hover:underline">
            sweep a setting
          </Link>
          .
        </p>
      </div>
      <SetupForm
        estimateId={id}
        machine={base.machine}
        system={actor.unitSystem}
        currency={actor.currency}
      />
      <EstimateSafetyCaution />
    </div>
  );
}
