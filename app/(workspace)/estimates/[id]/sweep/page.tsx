import Link from "next/link";
import { loadSetupPage } from "@/features/options/server/load-setup-page";
import { SweepForm } from "@/features/options/components/sweep-form";
import { formatMoney } from "@/lib/format/format";
import { EstimateSafetyCaution } from "@/lib/ui/caution";

export const metadata = { title: "Sweep a setting" };

export default async function SweepSettingPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { actor, base } = await loadSetupPage(id);
  return (
    <div className="flex flex-col gap-4">
      <div>
        <h1 className="text-2xl font-bold text-ink-900">Sweep a setting</h1>
        <p className="text-ink-700">
          {base.machineName} on{" "}
          <Link href={`/estimates/${id}`} className="text-furrow-700 hover:underline">
            {base.estimateTitle}
          </Link>
          ; today {formatMoney(base.costPerHour, actor.currency)} per operating hour. The engine
          prices the duty cycle at each value of one setting.
        </p>
      </div>
      <SweepForm estimateId={id} machine={base.machine} system={actor.unitSystem} />
      <EstimateSafetyCaution />
    </div>
  );
}
