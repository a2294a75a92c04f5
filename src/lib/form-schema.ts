import { z } from 'zod';

export type FormPath = (string | number)[];
export type FormIssue = { path: FormPath; message: string };
export type ApiIssue = z.core.$ZodIssue;

type FormSchemaOptions<TValues, TOut> = {
  /** Form text (in the user's units) to the API's draft; `issue` reports text that is not a value at all. */
  toDraft: (values: TValues, issue: (path: FormPath, message: string) => void) => unknown;
  /** The shared API schema: the one the server parses with. */
  schema: z.ZodType<TOut>;
  /** Where an API path sits in the form (pourTempC → pourTemp); the same path when left out. */
  formPathOf?: (apiPath: readonly PropertyKey[]) => FormPath;
  /** A message in the user's terms (bounds in their unit); the schema's own when left out. */
  messageOf?: (issue: ApiIssue) => string;
};

const plainPath = (path: readonly PropertyKey[]): FormPath => path.map((p) => (typeof p === 'number' ? p : String(p)));

/**
 * A schema for zodResolver whose form holds text in the user's units: it
 * converts to the API draft, then validates with the shared API schema, so
 * the form can never accept what the server would refuse. Issues land on
 * the form's own field names.
 */
export function formSchemaFor<TValues, TOut>({ toDraft, schema, formPathOf = plainPath, messageOf }: FormSchemaOptions<TValues, TOut>) {
  return z
    .custom<TValues>((v) => typeof v === 'object' && v !== null)
    .transform((values, ctx): TOut => {
      const issues: FormIssue[] = [];
      const draft = toDraft(values, (path, message) => issues.push({ path, message }));
      const parsed = schema.safeParse(draft);
      if (!parsed.success) {
        for (const issue of parsed.error.issues) {
          const path = formPathOf(issue.path);
          // A value the conversion already refused reaches the schema as
          // missing; its first message is the useful one.
          if (issues.some((i) => i.path.join('.') === path.join('.'))) continue;
          issues.push({ path, message: messageOf ? messageOf(issue) : issue.message });
        }
      }
      for (const issue of issues) ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message });
      return issues.length > 0 || !parsed.success ? z.NEVER : parsed.data;
    });
}

/**
 * A bound refused by the schema, in words with the figure in the user's
 * unit ("At most 3272 °F"); null for other issues, which keep their message.
 */
export function boundMessage(issue: ApiIssue, format: (value: number) => string): string | null {
  if (issue.code === 'too_big' && typeof issue.maximum === 'number') {
    return issue.inclusive === false ? `Must be below ${format(issue.maximum)}` : `At most ${format(issue.maximum)}`;
  }
  if (issue.code === 'too_small' && typeof issue.minimum === 'number') {
    return issue.inclusive === false ? `Must be above ${format(issue.minimum)}` : `At least ${format(issue.minimum)}`;
  }
  return null;
}
