import { redirect } from "next/navigation";
import { getActor } from "@/features/auth/server/get-actor";
import { NotAllowed } from "@/features/auth/components/not-allowed";
import { BrandingForm } from "@/features/reports/components/branding-form";
import { can } from "@/lib/authz/policy";

export const metadata = { title: "Report branding" };

export default async function BrandingPage() {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  if (!can(actor, "staff:manage")) return <NotAllowed what="Report branding" />;
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-bold text-ink-900">Report branding</h1>
      <BrandingForm />
    </div>
  );
}
