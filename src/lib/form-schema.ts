import { z } from 'zod';
import { plainIssueMessage } from './form-messages.ts';

/** Puts an issue on a form field: a path in the form's own field names ('price.amount'). */
export type AddFieldIssue = (path: string, message: string) => void;

/**
 * A form whose inputs are text (numbers, dates, a price in major units) checked by the shared
 * body schema of the API: `toBody` turns the typed values into the body, the shared schema checks
 * it, and each of its issues is put back on the field it came from (`toField`). The result is
 * the parsed body, ready to send. Use with `zodResolver(formSchema(…))`.
 */
export function formSchema<V, B>(
  body: z.ZodType<B>,
  toBody: (values: V, addIssue: AddFieldIssue) => unknown,
  toField: (bodyPath: string) => string = (p) => p,
) {
  // The values come from the form's own inputs (text, selects): their shape is the form's type.
  return z.custom<V>().transform((input, ctx): B => {
    const issues = new Map<string, string>();
    const add: AddFieldIssue = (path, message) => {
      if (!issues.has(path)) issues.set(path, message);
    };
    const parsed = body.safeParse(toBody(input, add), { error: plainIssueMessage });
    if (parsed.success && issues.size === 0) return parsed.data;
    if (!parsed.success) for (const issue of parsed.error.issues) add(toField(issue.path.join('.')), issue.message);
    for (const [path, message] of issues) ctx.addIssue({ code: 'custom', message, path: path.split('.') });
    return z.NEVER;
  });
}

/** Text typed in a number field: '' → null (left blank), otherwise a number (NaN is refused later). */
export function numberOrNull(text: string): number | null {
  const t = text.trim();
  return t === '' ? null : Number(t);
}

/** Text typed in an optional text field: '' → null. */
export function textOrNull(text: string): string | null {
  const t = text.trim();
  return t === '' ? null : t;
}

/** A number as a form shows it for editing ('' for none). */
export function numberText(value: number | null | undefined): string {
  return value === null || value === undefined ? '' : String(value);
}
