import type { z } from 'zod';

/**
 * Plain-language fallbacks for zod issues that carry no message of their own (the shared schemas'
 * own messages always win). Pass as `zodResolver(schema, { error: plainIssueMessage })`.
 */
export const plainIssueMessage: z.core.$ZodErrorMap = (issue) => {
  if (issue.input === '' || issue.input === undefined) return 'Fill in this field.';
  switch (issue.code) {
    case 'too_small':
      return issue.origin === 'string' ? `Use at least ${issue.minimum} characters.` : undefined;
    case 'too_big':
      return issue.origin === 'string' ? `Use at most ${issue.maximum} characters.` : undefined;
    case 'invalid_value':
      return 'Choose one of the options.';
    case 'invalid_format':
      return issue.format === 'email' ? 'Enter a valid e-mail address.' : undefined;
    default:
      return undefined;
  }
};
