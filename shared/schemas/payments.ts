import { z } from 'zod';

/** The answer to the payment provider's webhook: received, and whether it was already known. */
export const paymentWebhookResponseSchema = z.object({
  received: z.literal(true),
  duplicate: z.boolean(),
});
export type PaymentWebhookResponse = z.infer<typeof paymentWebhookResponseSchema>;
