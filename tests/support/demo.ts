// The demo production as the seeder writes it (seeders/*-demo-production.cjs): the one place tests
// and benchmarks read its sign-ins, its name and its size from. The seeder and scripts/lib/project.mjs
// run as plain CommonJS/Node before any TypeScript loads, so they keep their own copy; if the seeder
// changes, change this file with it.

/** The password of every demo account (demo data only). */
export const DEMO_PASSWORD = "lantern-demo-2026";

/** The demo accounts, one for each role of the production. */
export const DEMO_USERS = {
  designer: "maren.oduya@quillmere.test",
  electrician: "teodor.brask@quillmere.test",
  stageManager: "ines.calloway@quillmere.test",
  viewer: "rafe.lindqvist@quillmere.test",
} as const;

export type DemoRole = keyof typeof DEMO_USERS;

export const DEMO_PRODUCTION_NAME = "Salt and Lantern";

/** Units the seeder hangs (12 positions). A test that adds units to the demo must remove them again. */
export const DEMO_FIXTURE_COUNT = 116;

/** The demo production's id from a `GET /api/productions` answer; throws when the account is not a member. */
export function demoIdFrom(list: { productions?: Array<{ id: number; name: string }> }): number {
  const found = list.productions?.find((p) => p.name === DEMO_PRODUCTION_NAME);
  if (!found) throw new Error(`"${DEMO_PRODUCTION_NAME}" is not among this account's productions`);
  return found.id;
}
