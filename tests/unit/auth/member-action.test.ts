// The server-action wrappers (lib/auth/member-action.ts): what a form gets back for each kind of
// refusal, and that the work never runs before the role and the input are checked.
import { beforeEach, describe, expect, it, vi } from "vitest";
import { z } from "zod";
import { AppError } from "@/lib/errors";

const requireMember = vi.fn();
vi.mock("@/lib/auth/guards", () => ({ requireMember: (...args: unknown[]) => requireMember(...args) }));
const { formAction, memberAction } = await import("@/lib/auth/member-action");
const { redirect } = await import("next/navigation");

const renameSchema = z.object({
  name: z.string().trim().min(1, { error: "Name is required" }),
  password: z.string().optional(),
});
const form = (fields: Record<string, string>) => {
  const f = new FormData();
  for (const [k, v] of Object.entries(fields)) f.set(k, v);
  return f;
};
const IDLE = { status: "idle" } as const;
const designer = {
  user: { id: 7, name: "D", email: "d@example.test" },
  member: { role: "designer", isOwner: true },
  productionId: 3,
};

beforeEach(() => {
  requireMember.mockReset();
});

describe("memberAction", () => {
  it("checks membership and role first, for the bound production, and runs nothing when refused", async () => {
    requireMember.mockRejectedValue(new AppError("forbidden", "Your role on this production cannot do that."));
    const work = vi.fn();
    const action = memberAction("settings.edit", renameSchema, work);
    const state = await action(3, IDLE, form({ name: "Harbour" }));
    expect(requireMember).toHaveBeenCalledWith(3, "settings.edit");
    expect(work).not.toHaveBeenCalled();
    expect(state).toEqual({
      status: "error",
      message: "Your role on this production cannot do that.",
      fieldErrors: {},
      values: { name: "Harbour" },
    });
  });

  it("sends a bound id that is not a plain id through the id rule (404 for an outsider's guess)", async () => {
    requireMember.mockResolvedValue(designer);
    const action = memberAction("settings.edit", renameSchema, async () => ({}));
    await action(1.5, IDLE, form({ name: "x" }));
    await action(Number.NaN, IDLE, form({ name: "x" }));
    expect(requireMember.mock.calls.map((c) => c[0])).toEqual(["1.5", "NaN"]);
  });

  it("names each refused field, echoes what was typed but never a password, and runs nothing", async () => {
    requireMember.mockResolvedValue(designer);
    const work = vi.fn();
    const state = await memberAction("settings.edit", renameSchema, work)(
      3,
      IDLE,
      form({ name: "  ", password: "hunter22" }),
    );
    expect(work).not.toHaveBeenCalled();
    expect(state).toMatchObject({
      status: "error",
      fieldErrors: { name: ["Name is required"] },
      values: { name: "  " },
    });
    expect(JSON.stringify(state)).not.toContain("hunter22");
  });

  it("hands the parsed input and the member to the work and returns its result as ok", async () => {
    requireMember.mockResolvedValue(designer);
    const state = await memberAction("settings.edit", renameSchema, async (input, ctx) => ({
      renamed: `${input.name}@${ctx.productionId}`,
      message: "Saved.",
    }))(3, IDLE, form({ name: " Harbour " }));
    expect(state).toEqual({ status: "ok", renamed: "Harbour@3", message: "Saved." });
  });

  it("turns a 409 into an error that carries the current row", async () => {
    requireMember.mockResolvedValue(designer);
    const current = { id: 3, version: 5, name: "Theirs" };
    const state = await memberAction("settings.edit", renameSchema, async () => {
      throw new AppError("conflict", "Someone else saved first.", { current });
    })(3, IDLE, form({ name: "Mine" }));
    expect(state).toEqual({
      status: "error",
      message: "Someone else saved first.",
      fieldErrors: {},
      values: { name: "Mine" },
      current,
    });
  });
});

describe("formAction", () => {
  it("lets redirect() through instead of reporting it as a failure", async () => {
    const action = formAction(renameSchema, async () => redirect("/productions"));
    await expect(action(IDLE, form({ name: "x" }))).rejects.toMatchObject({
      digest: expect.stringContaining("NEXT_REDIRECT"),
    });
  });

  it("reports an unexpected error plainly, without its text", async () => {
    const spy = vi.spyOn(console, "error").mockImplementation(() => {});
    const state = await formAction(renameSchema, async () => {
      throw new Error("ECONNRESET at 10.0.0.4");
    })(IDLE, form({ name: "x" }));
    expect(state).toMatchObject({
      status: "error",
      message: "Something went wrong on the server. The error has been logged.",
    });
    spy.mockRestore();
  });
});
