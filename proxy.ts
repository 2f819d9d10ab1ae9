// Sends signed-out visitors of signed-in pages to /sign-in. Not authorization: every route
// handler, server action and page still resolves the actor and checks the policy.
export { auth as proxy } from "@/features/auth/server/auth-config";

export const config = {
  // Every page except the public ones (home, sign-in, invitation, password reset, dev mailbox),
  // API routes (they answer 401 themselves), Next's assets and files with an extension. A new
  // workspace page is covered without editing this list.
  matcher: ["/((?!api/|_next/|sign-in|invite/|reset-password|dev/)(?!.*\\.\\w+$).+)"],
};
