import { z } from 'zod';
import { ROLES } from '@/lib/auth/roles';
import { UNIT_SYSTEMS } from '@/lib/units';
import { formBoolean } from './form';
import { idSchema } from './id';

const email = z
  .string({ error: 'E-mail is required.' })
  .trim()
  .toLowerCase()
  .max(254, 'E-mail must be at most 254 characters.')
  .pipe(z.email({ error: 'Enter a valid e-mail address.' }));

const newPassword = z
  .string({ error: 'Password is required.' })
  .min(10, 'Password must be at least 10 characters.')
  .max(200, 'Password must be at most 200 characters.');

export const roleSchema = z.enum(ROLES, { error: `Role must be one of ${ROLES.join(', ')}.` });

export const signInSchema = z.object({
  email,
  password: z.string({ error: 'Password is required.' }).min(1, 'Password is required.').max(200),
});

export const changePasswordSchema = z
  .object({
    currentPassword: z
      .string({ error: 'Current password is required.' })
      .min(1, 'Current password is required.')
      .max(200),
    newPassword,
    confirmPassword: z.string({ error: 'Repeat the new password.' }),
  })
  .refine((v) => v.newPassword === v.confirmPassword, {
    path: ['confirmPassword'],
    message: 'The two new passwords differ.',
  });

export const invitationSchema = z.object({
  email,
  role: roleSchema.default('buyer'),
});

export const acceptInvitationSchema = z
  .object({
    name: z
      .string({ error: 'Name is required.' })
      .trim()
      .min(1, 'Name is required.')
      .max(100, 'Name must be at most 100 characters.'),
    password: newPassword,
    confirmPassword: z.string({ error: 'Repeat the password.' }),
  })
  .refine((v) => v.password === v.confirmPassword, {
    path: ['confirmPassword'],
    message: 'The two passwords differ.',
  });

export const userUpdateSchema = z
  .object({
    role: roleSchema.optional(),
    disabled: z.boolean({ error: 'Disabled must be true or false.' }).optional(),
  })
  .strict()
  .refine((v) => v.role !== undefined || v.disabled !== undefined, {
    message: 'Give a role or a disabled flag to change.',
  });

export const userIdFormSchema = z.object({ userId: idSchema });

/** The admin users table's row form: the same change, with the id and flag as form strings. */
export const userUpdateFormSchema = z
  .object({
    userId: idSchema,
    role: roleSchema.optional(),
    disabled: formBoolean.optional(),
  })
  .refine((v) => v.role !== undefined || v.disabled !== undefined, {
    message: 'Give a role or a disabled flag to change.',
  });

export type InvitationInput = z.infer<typeof invitationSchema>;
export type AcceptInvitationInput = z.infer<typeof acceptInvitationSchema>;
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;
export type UserUpdateInput = z.infer<typeof userUpdateSchema>;

export const unitSystemSchema = z.object({
  unitSystem: z.enum(UNIT_SYSTEMS, { error: 'Choose SI or US customary units.' }),
});
