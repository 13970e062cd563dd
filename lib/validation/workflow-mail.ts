import { z } from 'zod';

/**
 * The workflow e-mail switch: `on` or `off` from the account form's radio buttons, or a JSON
 * boolean from the route handler; anything else (a missing field included) is refused.
 */
export const workflowMailSchema = z.object({
  workflowMail: z
    .preprocess(
      (v) => (v === true ? 'on' : v === false ? 'off' : v),
      z.enum(['on', 'off'], { error: 'Choose whether to receive workflow e-mails: on or off.' }),
    )
    .transform((v) => v === 'on'),
});
