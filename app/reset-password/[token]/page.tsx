import type { Metadata } from "next";
import Link from "next/link";
import { getDb } from "@/db/client";
import { AuthFrame, FormMessage } from "@/features/auth/components/auth-frame";
import { NewPasswordForm } from "@/features/auth/components/password-reset-forms";
import { isResetTokenUsable } from "@/features/auth/server/password-reset";

export const metadata: Metadata = { title: "Choose a new password" };

export default async function NewPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const usable = await isResetTokenUsable(getDb(), token);
  return (
    <AuthFrame title="Choose a new password">
      {usable ? (
        <NewPasswordForm token={token} />
      ) : (
        <>
          <FormMessage ok={false}>
            This reset link has expired or was already used. Ask for a new one.
          </FormMessage>
          <Link
            href="/reset-password"
            className="mt-4 inline-block text-sm text-furrow-700 hover:underline"
          >
            Ask for a new link
          </Link>
        </>
      )}
    </AuthFrame>
  );
}
