import type { Metadata } from "next";
import Link from "next/link";
import { getDb } from "@/db/client";
import { ROLE_LABELS } from "@/lib/authz/policy";
import { AuthFrame, FormMessage } from "@/features/auth/components/auth-frame";
import { InviteAcceptForm } from "@/features/auth/components/invite-accept-form";
import { viewInvitation } from "@/features/auth/server/accept-invitation";

export const metadata: Metadata = { title: "Invitation" };
export const dynamic = "force-dynamic";

const UNUSABLE = {
  valid: "",
  expired: "This invitation has expired.",
  used: "This invitation was already used.",
  revoked: "This invitation was withdrawn.",
} as const;

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = await viewInvitation(getDb(), token);
  if (!invitation || invitation.status !== "valid") {
    return (
      <AuthFrame title="Invitation">
        <FormMessage ok={false}>
          {invitation ? UNUSABLE[invitation.status] : "This invitation link is not valid."} Ask the
          dealership to send a new one.
        </FormMessage>
        <Link href="/sign-in" className="mt-4 inline-block text-sm text-furrow-700 hover:underline">
          Go to sign-in
        </Link>
      </AuthFrame>
    );
  }
  return (
    <AuthFrame title={`Join ${invitation.dealershipName}`}>
      <p className="mb-4 text-ink-700">
        You are invited as <strong>{ROLE_LABELS[invitation.role]}</strong>.
      </p>
      <InviteAcceptForm
        token={token}
        email={invitation.email}
        needsPassword={!invitation.hasAccount}
      />
    </AuthFrame>
  );
}
