import { z } from 'zod';

/** GET /api/public/methodology: docs/methodology.md rendered and sanitised on the server. */
export const methodologyResponseSchema = z.object({ html: z.string() });
export type MethodologyResponse = z.infer<typeof methodologyResponseSchema>;
