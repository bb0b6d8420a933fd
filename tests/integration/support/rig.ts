// Helpers for the rig import/export integration tests: multipart uploads and binary downloads with
// the same cookie jar as ApiSession, and a small production of a fresh designer's to import into.
import ExcelJS from "exceljs";
import { type ApiSession, freshUser, getBytes, postForm } from "./api";

export async function upload(
  s: ApiSession,
  productionId: number,
  file: { name: string; body: string | Uint8Array },
  options: Record<string, unknown>,
) {
  const form = new FormData();
  form.set("file", new File([file.body as BlobPart], file.name));
  form.set("options", JSON.stringify(options));
  return postForm(s, `/api/productions/${productionId}/import`, form);
}

export async function download(s: ApiSession, productionId: number, query: string) {
  const r = await getBytes(s, `/api/productions/${productionId}/export?${query}`);
  return {
    status: r.status,
    type: r.type,
    disposition: r.headers.get("content-disposition") ?? "",
    bytes: new Uint8Array(r.bytes),
  };
}

/** A fresh production owned by a fresh designer, with one pipe, one boom and two types. */
export async function rigProduction(units: "metric" | "imperial" = "metric") {
  const { session: s } = await freshUser("rigio");
  const id = (await s.post("/api/productions", { name: "Import test", venue: "Test hall", displayUnits: units })).json
    .production.id as number;
  const lx1 = (
    await s.post(`/api/productions/${id}/positions`, {
      name: "LX1",
      kind: "overhead-pipe",
      x1: -6,
      y1: 1,
      x2: 6,
      y2: 1,
      trimHeight: 7,
    })
  ).json.position;
  const boom = (
    await s.post(`/api/productions/${id}/positions`, { name: "Boom SL", kind: "boom", x1: 7, y1: 2, trimHeight: 5 })
  ).json.position;
  const profile = (
    await s.post(`/api/productions/${id}/fixture-types`, {
      name: "Profile 26",
      family: "profile",
      coneMinDeg: 26,
      coneMaxDeg: 26,
      peakCandela: 40000,
      frameSize: "6.25 in",
      dmxModes: [{ name: "dimmer", footprint: 1 }],
    })
  ).json.fixtureType;
  const wash = (
    await s.post(`/api/productions/${id}/fixture-types`, {
      name: "Wash 13",
      family: "led-wash",
      coneMinDeg: 15,
      coneMaxDeg: 45,
      peakCandela: 12000,
      dmxModes: [{ name: "full", footprint: 13 }],
    })
  ).json.fixtureType;
  return { s, id, lx1, boom, profile, wash };
}

export const fixturesOf = async (s: ApiSession, id: number) =>
  (await s.get(`/api/productions/${id}/fixtures`)).json.fixtures as any[];

export async function xlsxBytes(build: (wb: ExcelJS.Workbook) => void) {
  const wb = new ExcelJS.Workbook();
  build(wb);
  return new Uint8Array(await wb.xlsx.writeBuffer());
}
