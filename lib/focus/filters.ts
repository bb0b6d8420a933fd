// Filters and print options, read from the URL (bookmarkable) by the page, the print view and the PDF route.
import { z } from "zod";
import type { FixtureDto } from "@/lib/dto/fixture";
import { CHARTS_PER_PAGE, type ChartsPerPage } from "./pages";
import { isTimeZone } from "./words";

const optionalId = (what: string) =>
  z.preprocess(
    (v) => (v === "" || v == null ? undefined : v),
    z.coerce
      .number({ error: `${what} must be a number` })
      .int({ error: `${what} must be a whole number` })
      .positive({ error: `${what} must be positive` })
      .optional(),
  );

export const focusFilterSchema = z
  .object({
    position: optionalId("Position"),
    point: optionalId("Focus point"),
    chFrom: optionalId("First channel"),
    chTo: optionalId("Last channel"),
    status: z
      .enum(["all", "focused", "unfocused"], { error: "Status must be all, focused or unfocused" })
      .default("all"),
  })
  .refine((f) => f.chFrom == null || f.chTo == null || f.chFrom <= f.chTo, {
    error: "The first channel must not be above the last",
    path: ["chTo"],
  });
export type FocusFilter = z.infer<typeof focusFilterSchema>;

export const printOptionsSchema = z.object({
  perPage: z.preprocess(
    (v) => (v == null || v === "" ? 4 : Number(v)),
    z.union(
      CHARTS_PER_PAGE.map((n) => z.literal(n)) as [z.ZodLiteral<ChartsPerPage>, ...z.ZodLiteral<ChartsPerPage>[]],
      { error: "Charts per page must be 1, 2, 4 or 6" },
    ),
  ),
  paper: z.enum(["A4", "Letter"], { error: "Paper must be A4 or Letter" }).default("A4"),
  newPagePerPosition: z.preprocess((v) => (v == null || v === "" ? true : v !== "0" && v !== "false"), z.boolean()),
  tz: z.string().max(64).refine(isTimeZone, { error: "Time zone is not one we know" }).optional(),
});
export type PrintOptions = z.infer<typeof printOptionsSchema>;

export function filterFixtures<F extends Pick<FixtureDto, "positionId" | "focusPointId" | "channel" | "focused">>(
  list: F[],
  f: Partial<FocusFilter>,
): F[] {
  return list.filter(
    (x) =>
      (f.position == null || x.positionId === f.position) &&
      (f.point == null || x.focusPointId === f.point) &&
      (f.chFrom == null || (x.channel != null && x.channel >= f.chFrom)) &&
      (f.chTo == null || (x.channel != null && x.channel <= f.chTo)) &&
      (!f.status || f.status === "all" || (f.status === "focused") === x.focused),
  );
}

/** The filters and options as a query string for links to the print view, the PDF and the Excel sheet. */
export function toQuery(o: Record<string, string | number | boolean | undefined | null>): string {
  const q = new URLSearchParams();
  for (const [k, v] of Object.entries(o))
    if (v != null && v !== "" && v !== "all") q.set(k, String(v === true ? 1 : v === false ? 0 : v));
  return q.toString();
}
