import { z } from 'zod';
import { MODEL_CATEGORIES } from './models.ts';
import { emailSchema } from './users.ts';

/** Topics: every report, or reports on models of the chosen categories. */
export const topicsSchema = z.union([
  z.object({ all: z.literal(true) }).strict(),
  z
    .object({
      categories: z
        .array(z.enum(MODEL_CATEGORIES))
        .min(1, { message: 'Choose at least one kind of device, or every report.' })
        .max(MODEL_CATEGORIES.length)
        .transform((c) => [...new Set(c)]),
    })
    .strict(),
]);
export type Topics = z.infer<typeof topicsSchema>;

export const subscribeBodySchema = z.object({
  email: emailSchema,
  topics: topicsSchema,
  corrections: z.boolean().optional().default(false),
});
export type SubscribeBody = z.input<typeof subscribeBodySchema>;

/** The answer to every request that sends a confirmation e-mail, whether the address is known or not. */
export const checkYourEmailSchema = z.object({ status: z.literal('check_your_email') });

/** A token from an e-mailed link: random, URL-safe base64. */
export const tokenSchema = z
  .string()
  .trim()
  .min(20, { message: 'This link is incomplete.' })
  .max(200)
  .regex(/^[A-Za-z0-9_-]+$/, { message: 'This link is not one of ours.' });
export const tokenBodySchema = z.object({ token: tokenSchema });
export const tokenQuerySchema = z.object({ token: tokenSchema });

export const confirmedSchema = z.object({ status: z.literal('confirmed') });

/** What the preferences page shows and changes for the address its link was mailed to. */
export const readerPreferencesSchema = z.object({
  email: z.string(),
  subscription: z
    .object({
      status: z.enum(['pending', 'confirmed', 'unsubscribed']),
      topics: topicsSchema,
      corrections: z.boolean(),
    })
    .nullable(),
  /** Requests this address voted for (confirmed), and whether it hears when they are tested. */
  votes: z.object({ count: z.number().int(), notify: z.boolean() }),
});
export type ReaderPreferences = z.infer<typeof readerPreferencesSchema>;
export const readerPreferencesResponseSchema = z.object({ preferences: readerPreferencesSchema });

export const updatePreferencesBodySchema = z.object({
  token: tokenSchema,
  topics: topicsSchema.optional(),
  corrections: z.boolean().optional(),
  voteNotify: z.boolean().optional(),
});
export type UpdatePreferencesBody = z.input<typeof updatePreferencesBodySchema>;

export const unsubscribedSchema = z.object({ status: z.literal('unsubscribed') });
