import { z } from "zod";
import { ZEmail } from "@/features/auth/schemas/sign-in";

export const ZRole = z.enum(["dealer_admin", "estimator", "billing_admin", "customer"], {
  message: "Choose a role.",
});
export const ZStaffRole = z.enum(["dealer_admin", "estimator", "billing_admin"], {
  message: "Choose a staff role.",
});

export const ZInviteInput = z
  .object({
    email: ZEmail,
    role: ZRole,
    customerId: z
      .string()
      .uuid("Choose the customer this account belongs to.")
      .nullish()
      .or(z.literal("").transform(() => null)),
  })
  .refine((v) => v.role !== "customer" || Boolean(v.customerId), {
    path: ["customerId"],
    message: "Choose the customer this account belongs to.",
  });

export const ZSetRolesInput = z.object({
  userId: z.string().min(1, "Choose a member."),
  roles: z.array(ZStaffRole).min(1, "Keep at least one role, or remove the member instead."),
});

export const ZRemoveMemberInput = z.object({ userId: z.string().min(1, "Choose a member.") });

export const ZAcceptInvitationInput = z.object({
  token: z.string().min(10).max(200),
  name: z.string().trim().min(1, "Enter your name.").max(120, "Use at most 120 characters."),
});

export type TInviteInput = z.infer<typeof ZInviteInput>;
