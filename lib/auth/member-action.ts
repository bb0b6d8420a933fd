import "server-only";
import { unstable_rethrow } from "next/navigation";
import { z } from "zod";
import { toAppError } from "@/lib/errors";
import type { ActionError, ActionState } from "@/lib/http/action-state";
import { requireMember, type MemberContext } from "./guards";
import type { Permission } from "./policy";

/**
 * Server actions in one shape, the forms' side of `route()`: the FormData is read with a zod schema
 * (a refusal names each field), then the work runs; an expected failure (AppError: 403, 404, 409 …)
 * comes back as `{ status: "error", message, fieldErrors }` with what was typed, never as a throw.
 * `redirect()` and `notFound()` inside the work still do their job.
 *
 *   export const renameThingAction = memberAction("plot.edit", renameThingSchema, async (input, { user, productionId }) => {
 *     const thing = await renameThing({ productionId, userId: user.id, ...input });
 *     return { thing, message: "Renamed." };
 *   });
 *   // client: useActionState(renameThingAction.bind(null, productionId), IDLE)
 */
export type FormAction<T extends object> = (prev: ActionState<T>, form: FormData) => Promise<ActionState<T>>;

const CHECK_FIELDS = "Some fields need fixing; see the marked fields.";

/** A password is read, never echoed back into the page. */
const NEVER_ECHOED = /password/i;

/** The text fields of a form (a repeated name keeps its last value), without Next's own action fields. */
function textValues(form: FormData): Record<string, string> {
  const values: Record<string, string> = {};
  for (const [key, value] of form.entries())
    if (typeof value === "string" && !key.startsWith("$ACTION")) values[key] = value;
  return values;
}

function echo(values: Record<string, string>): Record<string, string> {
  return Object.fromEntries(Object.entries(values).filter(([key]) => !NEVER_ECHOED.test(key)));
}

function refusal(err: unknown, values: Record<string, string>): ActionError {
  unstable_rethrow(err); // redirect(), notFound() and Next's own signals are not failures
  const e = toAppError(err);
  return {
    status: "error",
    message: e.message,
    fieldErrors: e.details.fieldErrors ?? {},
    values: echo(values),
    ...(e.details.current !== undefined ? { current: e.details.current } : {}),
  };
}

async function run<S extends z.ZodType, T extends object>(
  form: FormData,
  schema: S,
  work: (input: z.output<S>) => Promise<T>,
): Promise<ActionState<T>> {
  const values = textValues(form);
  const parsed = schema.safeParse(values);
  if (!parsed.success)
    return {
      status: "error",
      message: CHECK_FIELDS,
      fieldErrors: z.flattenError(parsed.error).fieldErrors as Record<string, string[]>,
      values: echo(values),
    };
  try {
    return { status: "ok", ...(await work(parsed.data)) };
  } catch (err) {
    return refusal(err, values);
  }
}

/** An action anyone may post (sign-in, sign-up): input checked, failures typed. */
export function formAction<S extends z.ZodType, T extends object>(
  schema: S,
  work: (input: z.output<S>) => Promise<T>,
): FormAction<T> {
  return (_prev, form) => run(form, schema, work);
}

/**
 * An action on one production: the membership and role are checked again on every call (an action
 * can be POSTed to directly, whatever the page showed), then the input, then the work. The
 * production's id comes first, bound by the page: `action.bind(null, productionId)`.
 */
export function memberAction<S extends z.ZodType, T extends object>(
  permission: Permission,
  schema: S,
  work: (input: z.output<S>, ctx: MemberContext) => Promise<T>,
): (productionId: number, prev: ActionState<T>, form: FormData) => Promise<ActionState<T>> {
  return async (productionId, _prev, form) => {
    let ctx: MemberContext;
    try {
      // The bound id is the client's to send: anything but a plain id goes through the URL rule (404).
      ctx = await requireMember(
        Number.isSafeInteger(productionId) && productionId > 0 ? productionId : String(productionId),
        permission,
      );
    } catch (err) {
      return refusal(err, textValues(form));
    }
    return run(form, schema, (input) => work(input, ctx));
  };
}
