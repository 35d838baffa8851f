import { z } from 'zod';

/** One message the local SMTP fake caught, as the development Outbox lists it. */
export const capturedMailSchema = z.object({
  id: z.string(),
  receivedAt: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  html: z.string(),
  /** Every http(s) link in the text part, so the Outbox can show and tests can follow them. */
  links: z.array(z.string()),
});
export type CapturedMail = z.infer<typeof capturedMailSchema>;
