import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { AuthFrame } from "@/features/auth/components/auth-frame";
import { SignInPanel } from "@/features/auth/components/sign-in-panel";
import { signInNotice } from "@/features/auth/schemas/sign-in-notice";
import { safeCallbackPath } from "@/features/auth/schemas/callback-url";
import { getActor, hasValidSession } from "@/features/auth/server/get-actor";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const params = await searchParams;
  const callbackUrl = safeCallbackPath(params.callbackUrl);
  if (await getActor()) redirect(callbackUrl);
  // Signed in, but no longer a member of any dealership (removed since signing in).
  const notice = (await hasValidSession())
    ? {
        ok: false,
        text: "Your account is not a member of any dealership now. Ask a dealer admin to invite you again.",
      }
    : signInNotice(params);
  return (
    <AuthFrame title="Sign in to Treadcast">
      <SignInPanel callbackUrl={callbackUrl} notice={notice} />
    </AuthFrame>
  );
}
