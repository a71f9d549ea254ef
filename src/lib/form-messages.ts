import type { z } from 'zod';

/**
 * Plain-language fallbacks for zod issues that carry no message of their own (the shared schemas'
 * own messages always win). Pass as `zodResolver(schema, { error: plainIssueMessage })`.
 */
export const plainIssueMessage: z.core.$ZodErrorMap = (issue) => {
  if (issue.input === '' || issue.input === undefined || issue.input === null) return 'Fill in this field.';
  switch (issue.code) {
    case 'invalid_type':
      if (issue.expected === 'int') return 'Enter a whole number.';
      return issue.expected === 'number' ? 'Enter a number.' : undefined;
    case 'too_small':
      if (issue.origin === 'number') return issue.inclusive ? `Enter ${issue.minimum} or more.` : `Enter a number above ${issue.minimum}.`;
      return issue.origin === 'string' ? `Use at least ${issue.minimum} characters.` : undefined;
    case 'too_big':
      if (issue.origin === 'number') return issue.inclusive ? `Enter ${issue.maximum} or less.` : `Enter a number below ${issue.maximum}.`;
      if (issue.origin === 'array') return `Give at most ${issue.maximum}.`;
      return issue.origin === 'string' ? `Use at most ${issue.maximum} characters.` : undefined;
    case 'invalid_value':
      return 'Choose one of the options.';
    case 'invalid_format':
      if (issue.format === 'url') return 'Enter a full address, e.g. https://…';
      return issue.format === 'email' ? 'Enter a valid e-mail address.' : undefined;
    default:
      return undefined;
  }
};
