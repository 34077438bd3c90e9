/**
 * Input shapes of sign-up, sign-in, e-mail verification, password reset, invitations and account changes:
 * one zod schema per form, imported by the API route and by the island alike. Objects are strict, so an
 * unknown field is an error rather than silently dropped.
 */
import { z } from 'zod';
import { ROLES } from './actor';
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from './password-rules';

/** Longest e-mail address SMTP can carry (RFC 5321 §4.5.3.1.3: 256-octet path minus the angle brackets). */
export const EMAIL_MAX_LENGTH = 254;
export const DISPLAY_NAME_MAX_LENGTH = 80;
export const SCHOOL_NAME_MAX_LENGTH = 120;

/**
 * What a person's, school's or class's name may hold: letters and marks of any script, digits, spaces and the
 * punctuation names use (. , ' ’ & ( ) / # : + - ! ?). Markup (< > " =), statement separators (;) and control
 * characters have no place in a name, so text built to inject HTML or SQL is refused at the door.
 */
export const NAME_PATTERN = /^[\p{L}\p{M}\p{N} .,'’&()/#:+\-!?]*$/u;
export const NAME_PATTERN_MESSAGE = "Use letters, digits, spaces and . , ' & ( ) / # : + - ! ? only.";

/** Counts Unicode code points, as NIST SP 800-63B-4 asks, rather than UTF-16 units. */
function codePointLength(value: string): number {
  return [...value].length;
}

/** An e-mail address, trimmed and lower-cased (accounts are unique by lower-cased address). */
export const EmailSchema = z
  .string({ required_error: 'Enter your e-mail address.', invalid_type_error: 'The e-mail address must be text.' })
  .trim()
  .min(1, 'Enter your e-mail address.')
  .max(EMAIL_MAX_LENGTH, `An e-mail address has at most ${EMAIL_MAX_LENGTH} characters.`)
  .email('Enter an e-mail address like name@school.org.')
  .transform((value) => value.toLowerCase());

/** A new password: length rules only, no composition rules (NIST SP 800-63B-4 §3.1.1.2). Never trimmed. */
export const NewPasswordSchema = z
  .string({ required_error: 'Choose a password.', invalid_type_error: 'The password must be text.' })
  .refine((value) => codePointLength(value) >= PASSWORD_MIN_LENGTH, {
    message: `Use at least ${PASSWORD_MIN_LENGTH} characters; a few unrelated words make a good one.`,
  })
  .refine((value) => codePointLength(value) <= PASSWORD_MAX_LENGTH, {
    message: `Use at most ${PASSWORD_MAX_LENGTH} characters.`,
  });

/** A password typed to sign in: any length up to the maximum (older rules may have allowed shorter ones). */
export const CurrentPasswordSchema = z
  .string({ required_error: 'Enter your password.', invalid_type_error: 'The password must be text.' })
  .min(1, 'Enter your password.')
  .max(PASSWORD_MAX_LENGTH * 4, 'That password is longer than any we accept.');

/** A person's name as shown to colleagues: 1–80 characters, no angle brackets or control characters. */
export const DisplayNameSchema = z
  .string({ required_error: 'Enter your name.', invalid_type_error: 'The name must be text.' })
  .trim()
  .min(1, 'Enter your name as colleagues know it.')
  .max(DISPLAY_NAME_MAX_LENGTH, `A name has at most ${DISPLAY_NAME_MAX_LENGTH} characters.`)
  .regex(NAME_PATTERN, NAME_PATTERN_MESSAGE);

/** A school name or city proposed at sign-up. */
const SchoolTextSchema = (what: string) =>
  z
    .string({ invalid_type_error: `The school's ${what} must be text.` })
    .trim()
    .max(SCHOOL_NAME_MAX_LENGTH, `A school's ${what} has at most ${SCHOOL_NAME_MAX_LENGTH} characters.`)
    .regex(NAME_PATTERN, NAME_PATTERN_MESSAGE);

/** The one-time token of a mailed link: 32 random bytes in base64url (43 characters). */
export const TokenSchema = z
  .string({ required_error: 'The link is missing its token.', invalid_type_error: 'The token must be text.' })
  .regex(/^[A-Za-z0-9_-]{43}$/, 'This link is not complete; open it again from the e-mail, or ask for a new one.');

export const SignInSchema = z
  .object({
    email: EmailSchema,
    password: CurrentPasswordSchema,
  })
  .strict();
export type SignIn = z.infer<typeof SignInSchema>;

/** Sign-up of a teacher: the school is picked from the list or proposed (a coordinator approves it later). */
export const SignUpSchema = z
  .object({
    email: EmailSchema,
    displayName: DisplayNameSchema,
    password: NewPasswordSchema,
    /** "existing": schoolId names an approved school; "proposed": a new school by name and city. */
    schoolChoice: z.enum(['existing', 'proposed'], {
      errorMap: () => ({ message: 'Pick your school from the list, or propose a new one.' }),
    }),
    schoolId: z.string().uuid('Pick your school from the list.').optional().or(z.literal('')),
    proposedSchoolName: SchoolTextSchema('name').optional(),
    proposedSchoolCity: SchoolTextSchema('town or city').optional(),
  })
  .strict()
  .superRefine((value, ctx) => {
    if (value.schoolChoice === 'existing' && !value.schoolId) {
      ctx.addIssue({ code: 'custom', path: ['schoolId'], message: 'Pick your school from the list.' });
    }
    if (value.schoolChoice === 'proposed') {
      if (!value.proposedSchoolName) {
        ctx.addIssue({ code: 'custom', path: ['proposedSchoolName'], message: "Enter the school's name." });
      }
      if (!value.proposedSchoolCity) {
        ctx.addIssue({ code: 'custom', path: ['proposedSchoolCity'], message: 'Enter the town or city.' });
      }
    }
  });
export type SignUp = z.infer<typeof SignUpSchema>;

export const VerifyEmailSchema = z.object({ token: TokenSchema }).strict();

export const ForgotPasswordSchema = z.object({ email: EmailSchema }).strict();

export const ResetPasswordSchema = z.object({ token: TokenSchema, password: NewPasswordSchema }).strict();

export const PasswordChangeSchema = z
  .object({ currentPassword: CurrentPasswordSchema, newPassword: NewPasswordSchema })
  .strict();

/** Roles an admin may invite: teachers sign up themselves. */
export const INVITED_ROLES = ['coordinator', 'admin'] as const;

export const InvitationCreateSchema = z
  .object({
    email: EmailSchema,
    role: z.enum(INVITED_ROLES, { errorMap: () => ({ message: 'Invite a coordinator or an admin.' }) }),
  })
  .strict();

export const InvitationAcceptSchema = z
  .object({ token: TokenSchema, displayName: DisplayNameSchema, password: NewPasswordSchema })
  .strict();

/** An admin's change to an account: a new role, deactivation (active: false) or reactivation. */
export const AccountUpdateSchema = z
  .object({
    role: z.enum(ROLES, { errorMap: () => ({ message: 'Choose teacher, coordinator or admin.' }) }).optional(),
    active: z.boolean({ invalid_type_error: 'active must be true or false.' }).optional(),
  })
  .strict()
  .refine((value) => value.role !== undefined || value.active !== undefined, {
    message: 'Send a new role, or active: false to deactivate (true to reactivate).',
  });
