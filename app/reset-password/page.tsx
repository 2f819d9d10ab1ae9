import type { Metadata } from "next";
import Link from "next/link";
import { AuthFrame } from "@/features/auth/components/auth-frame";
import { RequestResetForm } from "@/features/auth/components/password-reset-forms";

export const metadata: Metadata = { title: "Reset password" };

export default function RequestResetPage() {
  return (
    <AuthFrame title="Reset your password">
      <p className="mb-4 text-sm text-ink-700">
        Enter the address you sign in with. We e-mail a link to choose a new password.
      </p>
      <RequestResetForm />
      <Link href="/sign-in" className="mt-4 inline-block text-sm text-furrow-700 hover:underline">
        Back to sign-in
      </Link>
    </AuthFrame>
  );
}
