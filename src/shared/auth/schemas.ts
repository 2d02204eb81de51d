import { z } from "zod";
import { ROLES as ROLE_VALUES } from "./roles";

// Form schemas shared by the client forms and the server (one definition, web-anchors C1). Password
// rules follow ASVS 4.0.3 V2.1 (web-anchors A2): 12 to 128 characters, any Unicode, no composition
// rules; the common-password check runs on the server only (the list is not shipped to browsers).
export const PASSWORD_MIN_LENGTH = 12;
export const PASSWORD_MAX_LENGTH = 128;

const codePoints = (value: string) => [...value].length;

export const emailSchema = z
  .string({ error: "Enter an e-mail address." })
  .trim()
  .toLowerCase()
  .min(1, "Enter an e-mail address.")
  .max(254, "That e-mail address is too long.")
  .pipe(z.email({ error: "Enter a valid e-mail address, like name@example.com." }));

export const newPasswordSchema = z
  .string({ error: "Enter a password." })
  .refine((v) => codePoints(v) >= PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters.`)
  .refine((v) => codePoints(v) <= PASSWORD_MAX_LENGTH, `Use at most ${PASSWORD_MAX_LENGTH} characters.`);

/** A password typed to sign in: only bounded, never judged (old accounts may predate a rule). */
const enteredPasswordSchema = z
  .string({ error: "Enter your password." })
  .min(1, "Enter your password.")
  .max(PASSWORD_MAX_LENGTH * 4, "That password is too long.");

const personNameSchema = z
  .string({ error: "Enter your name." })
  .trim()
  .min(1, "Enter your name.")
  .max(120, "Use at most 120 characters.")
  .refine((v) => !/[<>]/.test(v), "Angle brackets are not allowed in a name.");

export const shopNameSchema = z
  .string({ error: "Enter the shop's name." })
  .trim()
  .min(2, "Enter the shop's name (at least 2 characters).")
  .max(120, "Use at most 120 characters.")
  .refine((v) => !/[<>]/.test(v), "Angle brackets are not allowed in a shop name.");

export const roleSchema = z.enum(ROLE_VALUES, { error: "Choose a role." });

export const signUpSchema = z.object({
  shopName: shopNameSchema,
  name: personNameSchema,
  email: emailSchema,
  password: newPasswordSchema,
});

export const signInSchema = z.object({ email: emailSchema, password: enteredPasswordSchema, next: z.string().max(200).optional() });

const invitationToken = z.string().regex(/^[0-9a-f]{40}$/, "This invitation link is not valid.");

/** Three ways to accept: already signed in as the invitee, with an existing account, or a new one. */
export const acceptInvitationSchema = z.discriminatedUnion("mode", [
  z.object({ mode: z.literal("signed-in"), token: invitationToken }),
  z.object({ mode: z.literal("existing"), token: invitationToken, password: enteredPasswordSchema }),
  z.object({ mode: z.literal("new"), token: invitationToken, name: personNameSchema, password: newPasswordSchema }),
]);

export const inviteSchema = z.object({ email: emailSchema, role: roleSchema });
export const changeRoleSchema = z.object({ membershipId: z.uuid("Unknown member."), role: roleSchema });
export const removeMemberSchema = z.object({ membershipId: z.uuid("Unknown member.") });
export const revokeInvitationSchema = z.object({ invitationId: z.uuid("Unknown invitation.") });
export const resetRequestSchema = z.object({ email: emailSchema });
export const resetPasswordSchema = z.object({
  token: z.string().regex(/^[0-9a-f]{40}$/, "This reset link is not valid."),
  password: newPasswordSchema,
});
export const changePasswordSchema = z.object({ currentPassword: enteredPasswordSchema, newPassword: newPasswordSchema });
export const unitPreferenceSchema = z.object({ unitSystem: z.enum(["metric", "inch"], { error: "Choose metric or inch." }) });
export const endSessionSchema = z.object({ sessionRef: z.string().regex(/^[0-9a-f]{16}$/, "Unknown session.") });
export const switchShopSchema = z.object({ shopId: z.uuid("Unknown shop.") });
