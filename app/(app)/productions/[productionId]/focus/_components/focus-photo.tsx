"use client";

import { useEffect, useId, useState } from "react";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { useFocusPhoto } from "@/hooks/use-focus-photo";
import type { FixtureDto } from "@/lib/dto/fixture";
import type { FocusChart } from "@/lib/focus/chart-model";
import type { FocusPageData } from "./types";

// The server's cap (lib/data/focus-photos.ts); checked here too so a huge file is not sent over the venue's wifi.
const MAX_BYTES = 15 * 1024 * 1024;
/** Above this the browser shrinks the photo before sending it (a phone photo is 3–12 MB; the server keeps 1600 px anyway). */
const SHRINK_ABOVE = 2 * 1024 * 1024;
const SEND_PX = 2048;

/**
 * A smaller JPEG of the photo, drawn upright from its orientation tag, for the venue's slow wifi; the
 * original when the browser cannot decode it (the server then checks it and answers with its message).
 */
async function shrinkForUpload(file: File): Promise<File> {
  if (file.size <= SHRINK_ABOVE || typeof createImageBitmap !== "function") return file;
  try {
    const bitmap = await createImageBitmap(file, { imageOrientation: "from-image" });
    const scale = Math.min(1, SEND_PX / Math.max(bitmap.width, bitmap.height));
    const canvas = document.createElement("canvas");
    canvas.width = Math.round(bitmap.width * scale);
    canvas.height = Math.round(bitmap.height * scale);
    canvas.getContext("2d")!.drawImage(bitmap, 0, 0, canvas.width, canvas.height);
    bitmap.close();
    const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, "image/jpeg", 0.88));
    return blob && blob.size < file.size
      ? new File([blob], file.name.replace(/\.\w+$/, "") + ".jpg", { type: "image/jpeg" })
      : file;
  } catch {
    return file;
  }
}

const pick = "inline-flex min-h-12 cursor-pointer items-center justify-center rounded-md px-4 text-sm font-medium";

/** The deck photo of the current unit: take or choose one, replace it, remove it (electricians and the designer). */
export function FocusPhoto({ fixture, chart, data }: { fixture: FixtureDto; chart: FocusChart; data: FocusPageData }) {
  const { upload, remove } = useFocusPhoto(data.production.id);
  const inputId = useId();
  const [message, setMessage] = useState<{ text: string; tone: "error" | "ok" } | null>(null);
  const [confirming, setConfirming] = useState(false);
  const [preparing, setPreparing] = useState(false);
  // biome-ignore lint/correctness/useExhaustiveDependencies: the message and the question belong to the unit; a new unit clears them
  useEffect(() => {
    setMessage(null);
    setConfirming(false);
  }, [fixture.id]);
  const busy = upload.isPending || remove.isPending || preparing;
  const done = (text: string) => ({
    onSuccess: () => setMessage({ text, tone: "ok" as const }),
    onError: (err: Error) => setMessage({ text: err.message, tone: "error" as const }),
  });

  const onFile = async (picked: File | undefined) => {
    if (!picked) return;
    setMessage({ text: "Preparing the photo…", tone: "ok" });
    setPreparing(true);
    const file = await shrinkForUpload(picked).finally(() => setPreparing(false));
    if (file.size > MAX_BYTES) {
      setMessage({
        text: `The photo is ${(file.size / 1048576).toFixed(1)} MB; the limit is 15 MB. Nothing was saved.`,
        tone: "error",
      });
      return;
    }
    setMessage({ text: "Uploading…", tone: "ok" });
    upload.mutate(
      { id: fixture.id, version: fixture.version, file },
      done(chart.photo ? "Photo replaced." : "Photo saved."),
    );
  };
  const label = `unit ${fixture.unitNumber} on ${fixture.positionName}`;

  return (
    <section
      className="flex flex-col gap-2 rounded-md border border-line bg-surface p-3"
      aria-label="Focus photo"
      data-testid="focus-photo"
    >
      <h2 className="text-sm font-medium text-ink">Focus photo</h2>
      {chart.photo ? (
        <a href={chart.photo.href} target="_blank" rel="noopener" className="self-start">
          {/* eslint-disable-next-line @next/next/no-img-element -- our own route serves a small re-encoded copy */}
          <img
            src={chart.photo.thumbSrc}
            alt={`As focused: ${label}`}
            className="max-h-48 w-auto rounded border border-line"
            data-testid="focus-photo-preview"
          />
        </a>
      ) : (
        <p className="text-sm text-muted">
          {data.rights.focus
            ? "No photo yet. Take one of the pool on the deck once the unit is focused."
            : "No photo taken."}
        </p>
      )}
      {data.rights.focus && (
        <div className="flex flex-wrap gap-2">
          <input
            id={inputId}
            type="file"
            accept="image/*"
            capture="environment"
            className="peer sr-only"
            disabled={busy}
            data-testid="focus-photo-input"
            onChange={(e) => {
              void onFile(e.target.files?.[0]);
              e.target.value = "";
            }}
          />
          <label
            htmlFor={inputId}
            aria-disabled={busy}
            className={`${pick} ${chart.photo ? "border border-line bg-surface text-ink" : "bg-accent text-accent-ink"} ${busy ? "pointer-events-none opacity-50" : ""} peer-focus-visible:outline-2 peer-focus-visible:outline-accent`}
          >
            {upload.isPending ? "Uploading…" : chart.photo ? "Replace photo" : "Add photo"}
          </label>
          {chart.photo &&
            (confirming ? (
              <Button
                type="button"
                variant="danger"
                className="min-h-12"
                disabled={busy}
                data-testid="focus-photo-remove-confirm"
                onClick={() => {
                  setConfirming(false);
                  remove.mutate({ id: fixture.id, version: fixture.version }, done("Photo removed."));
                }}
              >
                Tap again to remove
              </Button>
            ) : (
              <Button
                type="button"
                variant="secondary"
                className="min-h-12"
                disabled={busy}
                onClick={() => setConfirming(true)}
                data-testid="focus-photo-remove"
              >
                Remove photo
              </Button>
            ))}
        </div>
      )}
      <div aria-live="polite">{message && <FormMessage message={message.text} tone={message.tone} />}</div>
    </section>
  );
}
