// Every route handler × every kind of caller, against the role table of the design (shared/DESIGN.md,
// "Roles"), written out here by hand so the code's own policy module is checked, not echoed. The route list
// is read from the app/api folder: a route or method with no row below fails the first test.
import { beforeAll, describe, expect, it } from "vitest";
import { DEMO_USERS } from "@/tests/support/demo";
import { ApiSession, demoProductionId, freshUser } from "./support/api";
import { routeTree } from "./support/route-tree";

type Caller = "designer" | "electrician" | "stageManager" | "viewer" | "outsider" | "anonymous";
type Role = Exclude<Caller, "outsider" | "anonymous">;
const ALL: Role[] = ["designer", "electrician", "stageManager", "viewer"];
const D: Role[] = ["designer"];
const DE: Role[] = ["designer", "electrician"];
const DS: Role[] = ["designer", "stageManager"];
/** Not tied to a production: any signed-in person, or anyone at all. */
type Scope = Role[] | "signed-in" | "public";

// METHOD and path pattern as in app/api → who may call it (DESIGN.md's role table).
const EXPECTED: Record<string, Scope> = {
  "GET /api/auth/me": "signed-in",
  "POST /api/auth/sign-in": "public",
  "POST /api/auth/sign-out": "public",
  "POST /api/auth/sign-up": "public", // the same answer whether or not the address has an account
  "POST /api/auth/sign-up/complete": "public", // the mailed link's token is the proof
  // Invitations to the signed-in account's own address, joined without their link.
  "GET /api/auth/invitations": "signed-in",
  "POST /api/auth/invitations/join": "signed-in",
  "POST /api/auth/password-reset": "public", // the same answer whether or not the address has an account
  "POST /api/auth/password-reset/confirm": "public", // the link's token is the proof
  "GET /api/health": "public",
  "GET /api/productions": "signed-in",
  "POST /api/productions": "signed-in",
  "GET /api/productions/[productionId]": ALL,
  "PATCH /api/productions/[productionId]": D, // settings
  // Archiving, restoring and deleting the production: its owner's (the demo's owner is its designer). A DELETE
  // here carries no typed name, so even the owner's is refused (400) and the demo stays.
  "DELETE /api/productions/[productionId]": D,
  "PUT /api/productions/[productionId]/archive": D,
  // Accessories (scrollers, irises …): the electrician's side of the rig.
  "GET /api/productions/[productionId]/accessories": ALL,
  "POST /api/productions/[productionId]/accessories": DE,
  "PATCH /api/productions/[productionId]/accessories/[accessoryId]": DE,
  "DELETE /api/productions/[productionId]/accessories/[accessoryId]": DE,
  // Plot: positions, focus marks, acting areas, landmarks, underlays: the designer's.
  "GET /api/productions/[productionId]/area-zones": ALL,
  "POST /api/productions/[productionId]/area-zones": D,
  "PATCH /api/productions/[productionId]/area-zones/[areaZoneId]": D,
  "DELETE /api/productions/[productionId]/area-zones/[areaZoneId]": D,
  "GET /api/productions/[productionId]/focus-points": ALL,
  "POST /api/productions/[productionId]/focus-points": D,
  "PATCH /api/productions/[productionId]/focus-points/[focusPointId]": D,
  "DELETE /api/productions/[productionId]/focus-points/[focusPointId]": D,
  "GET /api/productions/[productionId]/landmarks": ALL,
  "POST /api/productions/[productionId]/landmarks": D,
  "PATCH /api/productions/[productionId]/landmarks/[landmarkId]": D,
  "DELETE /api/productions/[productionId]/landmarks/[landmarkId]": D,
  "GET /api/productions/[productionId]/positions": ALL,
  "POST /api/productions/[productionId]/positions": D,
  "PATCH /api/productions/[productionId]/positions/[positionId]": D,
  "DELETE /api/productions/[productionId]/positions/[positionId]": D,
  "GET /api/productions/[productionId]/plot": ALL,
  "GET /api/productions/[productionId]/uploads": ALL,
  "POST /api/productions/[productionId]/uploads": D,
  "PATCH /api/productions/[productionId]/uploads/[uploadId]": D,
  "DELETE /api/productions/[productionId]/uploads/[uploadId]": D,
  "GET /api/productions/[productionId]/uploads/[uploadId]/file": ALL,
  // Fixture types: the designer's; their wattage and weight are the electrician's too (field level, below).
  "GET /api/productions/[productionId]/fixture-types": ALL,
  "POST /api/productions/[productionId]/fixture-types": D,
  "PATCH /api/productions/[productionId]/fixture-types/[fixtureTypeId]": DE,
  "DELETE /api/productions/[productionId]/fixture-types/[fixtureTypeId]": D,
  "GET /api/productions/[productionId]/rig/starter-types": ALL,
  "POST /api/productions/[productionId]/rig/starter-types": D,
  "GET /api/productions/[productionId]/rig/copy-types": D, // the designer's other productions' types
  "POST /api/productions/[productionId]/rig/copy-types": D,
  // Fixtures: hanging and removing units is the designer's; electrics and status the electrician's (field level).
  "GET /api/productions/[productionId]/fixtures": ALL,
  "POST /api/productions/[productionId]/fixtures": D,
  "DELETE /api/productions/[productionId]/fixtures": D,
  "GET /api/productions/[productionId]/fixtures/[fixtureId]": ALL,
  "PATCH /api/productions/[productionId]/fixtures/[fixtureId]": DE,
  "POST /api/productions/[productionId]/fixtures/bulk": DE,
  "GET /api/productions/[productionId]/fixtures/[fixtureId]/photo": ALL,
  "POST /api/productions/[productionId]/fixtures/[fixtureId]/photo": DE, // the as-focused record is the crew's
  "DELETE /api/productions/[productionId]/fixtures/[fixtureId]/photo": DE,
  // Import and export of rig data: import designer and electrician; export everyone.
  "GET /api/productions/[productionId]/export": ALL,
  "GET /api/productions/[productionId]/import": DE,
  "POST /api/productions/[productionId]/import": DE,
  "GET /api/productions/[productionId]/focus/pdf": ALL,
  "GET /api/productions/[productionId]/focus/xlsx": ALL,
  // Cues: the designer's; page and call note also the stage manager's (field level on PATCH).
  "GET /api/productions/[productionId]/cues": ALL,
  "POST /api/productions/[productionId]/cues": D,
  "GET /api/productions/[productionId]/cues/[cueId]": ALL,
  "PATCH /api/productions/[productionId]/cues/[cueId]": DS,
  "DELETE /api/productions/[productionId]/cues/[cueId]": D,
  "GET /api/productions/[productionId]/cues/export": ALL,
  "POST /api/productions/[productionId]/cues/import": D,
  "POST /api/productions/[productionId]/cues/renumber": D,
  "GET /api/productions/[productionId]/cues/summary": ALL,
  // Checks and studies: run by the designer and the electrician, seen by everyone.
  "GET /api/productions/[productionId]/checks": ALL,
  "GET /api/productions/[productionId]/checks/export": ALL,
  "GET /api/productions/[productionId]/checks/settings": ALL,
  "GET /api/productions/[productionId]/checks/units": ALL,
  "PATCH /api/productions/[productionId]/checks/settings": DE,
  "PATCH /api/productions/[productionId]/checks/positions/[positionId]": DE,
  "GET /api/productions/[productionId]/circuits": ALL,
  "POST /api/productions/[productionId]/circuits": DE,
  "POST /api/productions/[productionId]/circuits/batch": DE,
  "PATCH /api/productions/[productionId]/circuits/[circuitId]": DE,
  "DELETE /api/productions/[productionId]/circuits/[circuitId]": DE,
  "GET /api/productions/[productionId]/data-lines": ALL,
  "POST /api/productions/[productionId]/data-lines": DE,
  "PATCH /api/productions/[productionId]/data-lines/[dataLineId]": DE,
  "DELETE /api/productions/[productionId]/data-lines/[dataLineId]": DE,
  "GET /api/productions/[productionId]/performer-marks": ALL,
  "POST /api/productions/[productionId]/performer-marks": DE,
  "PATCH /api/productions/[productionId]/performer-marks/[performerMarkId]": DE,
  "DELETE /api/productions/[productionId]/performer-marks/[performerMarkId]": DE,
  "GET /api/productions/[productionId]/scenic-panels": ALL,
  "POST /api/productions/[productionId]/scenic-panels": DE,
  "PATCH /api/productions/[productionId]/scenic-panels/[scenicPanelId]": DE,
  "DELETE /api/productions/[productionId]/scenic-panels/[scenicPanelId]": DE,
  "GET /api/productions/[productionId]/studies/colours": ALL,
  "POST /api/productions/[productionId]/studies/colours": DE,
  "PATCH /api/productions/[productionId]/studies/colours/[colourId]": DE,
  "DELETE /api/productions/[productionId]/studies/colours/[colourId]": DE,
  // Computing a study changes nothing: everyone who may see studies may ask for one.
  "POST /api/productions/[productionId]/studies/coverage": ALL,
  "POST /api/productions/[productionId]/studies/coverage/areas": ALL,
  "POST /api/productions/[productionId]/studies/shadows": ALL,
  // Notes: any member writes and changes open notes (closing by kind is checked on the row, see notes tests);
  // the current cue is kept by the stage manager or board operator; the channel check is the crew's.
  "GET /api/productions/[productionId]/notes": ALL,
  "POST /api/productions/[productionId]/notes": ALL,
  "PATCH /api/productions/[productionId]/notes/[noteId]": ALL,
  "DELETE /api/productions/[productionId]/notes/[noteId]": ALL,
  "GET /api/productions/[productionId]/notes/current-cue": ALL,
  "PUT /api/productions/[productionId]/notes/current-cue": ["designer", "electrician", "stageManager"],
  "GET /api/productions/[productionId]/notes/work-call": ALL,
  "GET /api/productions/[productionId]/notes/counts": ALL, // the badges' open-note counts
  "POST /api/productions/[productionId]/notes/channel-check": DE,
  "POST /api/productions/[productionId]/notes/spot": ALL,
  "GET /api/productions/[productionId]/notes/show-reports": ALL,
  "POST /api/productions/[productionId]/notes/show-reports": ["stageManager"],
  "PATCH /api/productions/[productionId]/notes/show-reports/[reportId]": ["stageManager"], // a draft, until sent
  "POST /api/productions/[productionId]/notes/show-reports/[reportId]/send": ["stageManager"],
  // Team: everyone sees who is on it; invitations, role changes and removal are the owner's (the demo's owner is its designer).
  "GET /api/productions/[productionId]/team": ALL,
  "PATCH /api/productions/[productionId]/team/[memberId]": D,
  "DELETE /api/productions/[productionId]/team/[memberId]": D,
  "GET /api/productions/[productionId]/invitations": D,
  "POST /api/productions/[productionId]/invitations": D,
  "DELETE /api/productions/[productionId]/invitations/[invitationId]": D,
  "POST /api/productions/[productionId]/invitations/[invitationId]/resend": D,
  // Revisions: everyone reads them and each thing's history; issuing and restoring from one is the designer's and
  // the electrician's (a restore also needs each restored field's own right); the shop's address is the owner's;
  // each member chooses for themselves whether the revision e-mail comes.
  "GET /api/productions/[productionId]/revisions": ALL,
  "POST /api/productions/[productionId]/revisions": DE,
  "GET /api/productions/[productionId]/revisions/[revisionId]": ALL,
  "POST /api/productions/[productionId]/revisions/[revisionId]/restore": DE,
  "GET /api/productions/[productionId]/revisions/compare": ALL,
  "GET /api/productions/[productionId]/revisions/equipment": ALL,
  "GET /api/productions/[productionId]/revisions/latest": ALL,
  "GET /api/productions/[productionId]/revisions/shop": D,
  "PUT /api/productions/[productionId]/revisions/shop": D,
  "GET /api/productions/[productionId]/revisions/mail-choice": ALL,
  "PUT /api/productions/[productionId]/revisions/mail-choice": ALL,
  "GET /api/productions/[productionId]/history": ALL,
  // Accepting: the link's token is the proof.
  "POST /api/invitations/accept": "public",
};

const sessions = {} as Record<Caller, ApiSession>;
let productionId = 0;
const ids: Record<string, number> = {};

beforeAll(async () => {
  for (const role of ALL) sessions[role] = await new ApiSession().signIn(DEMO_USERS[role]);
  sessions.outsider = (await freshUser("matrix")).session;
  sessions.anonymous = new ApiSession();
  productionId = await demoProductionId(sessions.designer);
  // Real rows of the demo for reads; writes use a body no schema accepts, or (for DELETE) an id that
  // does not exist, so an allowed caller changes nothing.
  const first = async (list: string, key: string) => {
    const r = await sessions.designer.get(`/api/productions/${productionId}/${list}`);
    const rows = (r.json?.[key] ?? []) as Array<{ id: number }>;
    return rows[0]?.id ?? 2_147_483_000;
  };
  ids.fixtureId = await first("fixtures", "fixtures");
  ids.cueId = await first("cues", "cues");
  ids.positionId = await first("positions", "positions");
}, 120_000);

const MISSING = 2_147_483_000;
/** Query strings a read needs to be a valid request at all. */
const QUERY: Record<string, string> = {
  "GET /api/productions/[productionId]/cues/export": "?format=csv",
  "GET /api/productions/[productionId]/revisions/compare": "?from=current&to=current",
  "GET /api/productions/[productionId]/history": `?entity=fixture&id=${MISSING}`,
};
function concretePath(pattern: string, method: string): string {
  return pattern.replace(/\[(\w+)\]/g, (_, name: string) => {
    if (name === "productionId") return String(productionId);
    if (method !== "DELETE" && ids[name]) return String(ids[name]);
    return String(MISSING);
  });
}

describe("the route tree and the role table agree", () => {
  it("every route handler's method has a row in the expected table, and every row a handler", () => {
    const tree = routeTree();
    expect(tree.filter((r) => !(r in EXPECTED))).toEqual([]);
    expect(Object.keys(EXPECTED).filter((r) => !tree.includes(r))).toEqual([]);
  });

  it("each caller gets what the design allows: 401 signed out, 404 outside the production, 403 without the right", async () => {
    const callers: Caller[] = [...ALL, "outsider", "anonymous"];
    const mismatches: string[] = [];
    let checked = 0;
    for (const row of routeTree()) {
      const scope = EXPECTED[row];
      if (!scope || scope === "public") continue;
      const [method, pattern] = row.split(" ");
      const url = concretePath(pattern, method) + (QUERY[row] ?? "");
      for (const caller of callers) {
        // A JSON body no schema accepts (unknown key, no required fields, wrong version).
        const body = method === "GET" || method === "DELETE" ? undefined : { version: "not-a-version" };
        const r = await sessions[caller].request(method, url, body);
        checked++;
        let ok: boolean;
        if (caller === "anonymous") ok = r.status === 401;
        else if (scope === "signed-in") ok = ![401, 403, 404].includes(r.status);
        else if (caller === "outsider") ok = r.status === 404;
        else if (scope.includes(caller as Role))
          ok =
            ![401, 403].includes(r.status) &&
            r.status < 500 &&
            (method !== "GET" || r.status === 200 || r.status === 404);
        else ok = r.status === 403;
        if (!ok) mismatches.push(`${row} as ${caller}: ${r.status} ${JSON.stringify(r.json).slice(0, 120)}`);
      }
    }
    console.log(
      `authorization matrix: ${checked} requests (${routeTree().length} route methods × ${callers.length} callers, public routes aside), ${mismatches.length} mismatches`,
    );
    expect(mismatches).toEqual([]);
  }, 600_000);
});

// Field-level rules of the design's role table for a fixture: who may write each kind of field.
const FIELD_RULES: Array<{ field: string; value: unknown; roles: Role[] }> = [
  { field: "colour", value: "pale lavender", roles: D },
  { field: "channel", value: 901, roles: D },
  { field: "purpose", value: "test wash", roles: D },
  { field: "coneDeg", value: 31, roles: D },
  { field: "softnessDeg", value: 4, roles: D },
  { field: "circuit", value: "M-12", roles: DE },
  { field: "dimmer", value: "88", roles: DE },
  { field: "universe", value: 3, roles: DE },
  { field: "address", value: 401, roles: DE },
  { field: "hung", value: true, roles: DE },
  { field: "focused", value: true, roles: DE },
];

describe("field-level rules on a fixture", () => {
  it("each role may write exactly the fields the design gives it (403 names the field otherwise)", async () => {
    const mismatches: string[] = [];
    for (const rule of FIELD_RULES) {
      for (const role of ALL) {
        // A stale version: an allowed write gets 409 (nothing written), a refused one 403 naming the field.
        const r = await sessions[role].patch(`/api/productions/${productionId}/fixtures/${ids.fixtureId}`, {
          version: 999_999,
          [rule.field]: rule.value,
        });
        const allowed = rule.roles.includes(role);
        const ok = allowed
          ? r.status === 409
          : r.status === 403 && Object.keys(r.json?.error?.fieldErrors ?? {}).includes(rule.field);
        if (!ok) mismatches.push(`${rule.field} as ${role}: ${r.status} ${JSON.stringify(r.json).slice(0, 120)}`);
      }
    }
    expect(mismatches).toEqual([]);
  }, 120_000);
});
