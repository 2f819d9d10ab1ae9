import { z } from "zod";

export const ZEmail = z
  .string()
  .trim()
  .toLowerCase()
  .min(3, "Enter your e-mail address.")
  .max(254, "That address is too long.")
  .email("Enter a valid e-mail address, like name@farm.example.");

export const ZSignInInput = z.object({
  email: ZEmail,
  password: z.string().min(1, "Enter your password.").max(200, "That password is too long."),
});

export const ZMagicLinkInput = z.object({ email: ZEmail });

/** Passwords: long enough to resist guessing; no composition rules (NIST SP 800-63B §5.1.1.2). */
export const ZNewPassword = z
  .string()
  .min(10, "Use at least 10 characters.")
  .max(200, "Use at most 200 characters.");

export type TSignInInput = z.infer<typeof ZSignInInput>;
