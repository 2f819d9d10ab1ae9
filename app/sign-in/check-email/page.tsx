import type { Metadata } from "next";
import Link from "next/link";
import { AuthFrame } from "@/features/auth/components/auth-frame";

export const metadata: Metadata = { title: "Check your e-mail" };

export default function CheckEmailPage() {
  return (
    <AuthFrame title="Check your e-mail">
      <p className="text-ink-700">
        If the address has a Treadcast account, a sign-in link is on its way. It works once and
        expires in 15 minutes.
      </p>
      <Link href="/sign-in" className="mt-4 inline-block text-sm text-furrow-700 hover:underline">
        Back to sign-in
      </Link>
    </AuthFrame>
  );
}
