/**
 * Request and response shapes of sign-in, registration, password reset and invitations.
 * The server validates requests with these schemas and the client derives its form rules from them,
 * so a rule changed here changes in both places.
 */
import { z } from 'zod';
import { plainText } from './text';

export const roles = ['customer', 'sales', 'shop', 'admin'] as const;
export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;

/** Staff roles belong to the fabricator; customers belong to one customer organisation. */
export const staffRoles = ['sales', 'shop', 'admin'] as const satisfies readonly Role[];

const email = z
  .string({ error: 'Enter an e-mail address.' })
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: 'Enter a valid e-mail address.' }).max(254, { error: 'E-mail address is too long.' }));

const newPassword = z
  .string({ error: 'Enter a password.' })
  .min(10, { error: 'Use at least 10 characters.' })
  .max(200, { error: 'Use at most 200 characters.' });

export const loginSchema = z.object({
  email,
  password: z
    .string({ error: 'Enter your password.' })
    .min(1, { error: 'Enter your password.' })
    .max(200, { error: 'Use at most 200 characters.' }),
});
export type LoginInput = z.infer<typeof loginSchema>;

export const registerSchema = z
  .object({
    name: plainText({ error: 'Enter your name.' })
      .trim()
      .min(1, { error: 'Enter your name.' })
      .max(120, { error: 'Use at most 120 characters.' }),
    email,
    password: newPassword,
    organizationName: plainText()
      .trim()
      .min(2, { error: 'Use at least 2 characters.' })
      .max(120, { error: 'Use at most 120 characters.' })
      .optional(),
    inviteToken: z.string().min(1, { error: 'The invitation link is incomplete.' }).optional(),
  })
  .refine((v) => (v.organizationName === undefined) !== (v.inviteToken === undefined), {
    error: 'Name a new organisation, or register through an invitation link (one of the two).',
    path: ['organizationName'],
  });
export type RegisterInput = z.infer<typeof registerSchema>;

/** `POST /api/auth/register/confirm`: the token from the e-mailed link that finishes a registration. */
export const registerConfirmSchema = z.object({
  token: z.string({ error: 'The link is incomplete.' }).min(20, { error: 'The link is incomplete.' }).max(4000, { error: 'The link is too long.' }),
});
export type RegisterConfirmInput = z.infer<typeof registerConfirmSchema>;

export const resetRequestSchema = z.object({ email });
export type ResetRequestInput = z.infer<typeof resetRequestSchema>;

export const resetConfirmSchema = z.object({
  token: z.string({ error: 'The reset link is incomplete.' }).min(20, { error: 'The reset link is incomplete.' }),
  password: newPassword,
});
export type ResetConfirmInput = z.infer<typeof resetConfirmSchema>;

export const inviteSchema = z.object({
  email,
  role: roleSchema,
  organizationId: z.uuid({ error: 'Choose an organisation.' }).optional(),
});
export type InviteInput = z.infer<typeof inviteSchema>;

export const sessionUserSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
  organizationId: z.uuid(),
  organizationName: z.string(),
});
export type SessionUser = z.infer<typeof sessionUserSchema>;
