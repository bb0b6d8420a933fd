import { z } from "zod";
import { route } from "@/lib/http/respond";
import { requireMember } from "@/lib/auth/guards";
import { AppError, fromZodError, toAppError } from "@/lib/errors";
import { commitImport, getRememberedMapping, previewImport, type ImportRequest } from "@/lib/data/import";
import { MAX_IMPORT_BYTES } from "@/lib/io/file-kind";
import { IMPORT_FIELDS } from "@/lib/io/fields";
import { readUploadForm } from "@/lib/http/upload-form";

type Ctx = { params: Promise<{ productionId: string }> };

const optionsSchema = z
  .object({
    mode: z.enum(["preview", "commit"], { error: "mode must be preview or commit" }),
    mapping: z
      .array(z.enum(["ignore", ...IMPORT_FIELDS.map((f) => f.key)], { error: "unknown field in the mapping" }))
      .max(500)
      .optional(),
    lengthUnit: z.enum(["m", "ft"], { error: "lengthUnit must be m or ft" }).optional(),
    createMissing: z.boolean().default(false),
    sheet: z.string().max(100).optional(),
  })
  .strict();

/** What the import screen needs before a file is chosen: the fields and the remembered mapping. */
export const GET = route(async (_req, { params }: Ctx) => {
  const { productionId } = await requireMember((await params).productionId, "rig.import");
  return {
    fields: IMPORT_FIELDS.map((f) => ({ key: f.key, header: f.header })),
    remembered: await getRememberedMapping(productionId),
    maxBytes: MAX_IMPORT_BYTES,
  };
});

async function readUpload(req: Request): Promise<{ request: ImportRequest; mode: "preview" | "commit" }> {
  const { form, file } = await readUploadForm(req, {
    maxBytes: MAX_IMPORT_BYTES,
    what: "file",
    choose: "Choose a file to import.",
  });
  let raw: unknown = {};
  try {
    raw = JSON.parse(String(form.get("options") ?? "{}"));
  } catch {
    throw new AppError("bad_request", "The import options are not valid JSON.", {
      fieldErrors: { options: ["not valid JSON"] },
    });
  }
  const parsed = optionsSchema.safeParse(raw);
  if (!parsed.success) throw fromZodError(parsed.error);
  const { mode, ...opts } = parsed.data;
  return {
    mode,
    request: { ...opts, bytes: new Uint8Array(await file.arrayBuffer()), fileName: file.name || "upload" },
  };
}

/**
 * Preview (writes nothing) or commit (all rows in one transaction, or none). With ?stream=1 the
 * reply is newline-delimited JSON: progress lines (stage, done, total) while the file is read, checked
 * and written, then one line with the preview or result, or the error.
 */
export const POST = route(async (req, { params }: Ctx) => {
  const { productionId, member, user } = await requireMember((await params).productionId, "rig.import");
  const { mode, request } = await readUpload(req);
  const streamed = new URL(req.url).searchParams.get("stream") === "1";
  if (!streamed)
    return mode === "preview"
      ? { preview: await previewImport({ productionId, member, request }) }
      : { result: await commitImport({ productionId, member, userId: user.id, request }) };

  const encoder = new TextEncoder();
  // The reader went away (tab closed, request aborted): the next progress step throws, so a commit
  // still writing rolls back instead of landing unseen.
  let cancelled = false;
  const stream = new ReadableStream({
    async start(controller) {
      const send = (line: unknown) => cancelled || controller.enqueue(encoder.encode(JSON.stringify(line) + "\n"));
      try {
        const progress = (stage: string, done: number, total: number) => {
          if (cancelled || req.signal.aborted)
            throw new AppError("bad_request", "The import was cancelled before it finished; nothing was saved.");
          send({ progress: { stage, done, total } });
        };
        if (mode === "preview") send({ preview: await previewImport({ productionId, member, request, progress }) });
        else send({ result: await commitImport({ productionId, member, userId: user.id, request, progress }) });
      } catch (err) {
        const e = toAppError(err);
        send({ ...e.toJSON(), status: e.status });
      }
      if (!cancelled) controller.close();
    },
    cancel() {
      cancelled = true;
    },
  });
  return new Response(stream, {
    headers: { "content-type": "application/x-ndjson; charset=utf-8", "cache-control": "no-store" },
  });
});
