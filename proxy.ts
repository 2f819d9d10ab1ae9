// Sends signed-out visitors of signed-in pages to /sign-in. Not authorization: every route
// handler, server action and page still resolves the actor and checks the policy.
export { auth as proxy } from "@/features/auth/server/auth-config";

export const config = {
  matcher: [
    "/dashboard/:path*",
    "/customers/:path*",
    "/machines/:path*",
    "/estimates/:path*",
    "/duty-cycles/:path*",
    "/reports/:path*",
    "/team/:path*",
    "/audit/:path*",
    "/account/:path*",
    "/billing/:path*",
  ],
};
