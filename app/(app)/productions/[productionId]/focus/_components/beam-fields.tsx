"use client";

import { useEffect, useState } from "react";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import type { FocusPatch } from "@/hooks/use-focus";
import { useOutbox } from "@/lib/offline/outbox-context";
import { ApiError } from "@/lib/http/api-client";
import type { FixtureDto } from "@/lib/dto/fixture";
import { fixtureFieldsSchema } from "@/lib/validation/fixture";
import { barnDoorWords, goboRotationWords } from "@/lib/focus/words";
import type { FocusPageData } from "./types";

const LEAVES = [
  { key: "barnDoorTop", label: "Top" },
  { key: "barnDoorBottom", label: "Bottom" },
  { key: "barnDoorLeft", label: "Left" },
  { key: "barnDoorRight", label: "Right" },
] as const;
type LeafKey = (typeof LEAVES)[number]["key"];
type Errors = Partial<Record<string, string>>;
const input = "min-h-12 rounded-md border border-line bg-surface px-2 text-base text-ink";

const leavesOf = (f: FixtureDto) =>
  Object.fromEntries(LEAVES.map((l) => [l.key, f[l.key] ?? ""])) as Record<LeafKey, string>;

/**
 * Gobo rotation (the designer's) and barn doors as focused (the crew's), on the deck. Checked here with the
 * API's own schema, so the message at the field is the one the server would give.
 */
export function BeamFields({ fixture, data }: { fixture: FixtureDto; data: FocusPageData }) {
  const outbox = useOutbox();
  const [pending, setPending] = useState(false);
  const [rotation, setRotation] = useState(fixture.goboRotationDeg?.toString() ?? "");
  const [leaves, setLeaves] = useState(leavesOf(fixture));
  const [errors, setErrors] = useState<Errors>({});
  const [message, setMessage] = useState<{ text: string; tone: "error" | "ok" } | null>(null);
  // Reset when the unit or these fields change, not on every new copy of the row (marking focused or a new
  // photo would otherwise wipe what is being typed).
  const { id, goboRotationDeg, barnDoorTop, barnDoorBottom, barnDoorLeft, barnDoorRight } = fixture;
  // biome-ignore lint/correctness/useExhaustiveDependencies: reset when the unit or these fields change (see above)
  useEffect(() => {
    setRotation(goboRotationDeg?.toString() ?? "");
    setLeaves({
      barnDoorTop: barnDoorTop ?? "",
      barnDoorBottom: barnDoorBottom ?? "",
      barnDoorLeft: barnDoorLeft ?? "",
      barnDoorRight: barnDoorRight ?? "",
    });
    setErrors({});
  }, [id, goboRotationDeg, barnDoorTop, barnDoorBottom, barnDoorLeft, barnDoorRight]);
  // biome-ignore lint/correctness/useExhaustiveDependencies: the message belongs to the unit; a new unit clears it
  useEffect(() => setMessage(null), [id]);

  const save = async (patch: FocusPatch) => {
    const checked = fixtureFieldsSchema.partial().safeParse(patch);
    if (!checked.success) {
      setErrors(Object.fromEntries(checked.error.issues.map((i) => [String(i.path[0]), i.message])));
      return;
    }
    setErrors({});
    setPending(true);
    const outcome = await outbox.save(fixture, patch).finally(() => setPending(false));
    if (outcome.kind !== "error") {
      setMessage({ text: outcome.kind === "saved" ? "Saved." : "Waiting to send: kept on this device.", tone: "ok" });
      return;
    }
    const err = outcome.error;
    if (err instanceof ApiError)
      setErrors(Object.fromEntries(Object.entries(err.fieldErrors).map(([k, v]) => [k, v[0]])));
    setMessage({ text: err.message, tone: "error" });
  };
  const rotationValue = rotation.trim() === "" ? null : Number(rotation.trim().replace(/°$/, "").replace(",", "."));
  const leavesDirty = LEAVES.some((l) => (leaves[l.key].trim() || null) !== (fixture[l.key] ?? null));
  const doorsText = barnDoorWords({
    top: fixture.barnDoorTop,
    bottom: fixture.barnDoorBottom,
    left: fixture.barnDoorLeft,
    right: fixture.barnDoorRight,
  });

  return (
    <section
      className="flex flex-col gap-3 rounded-md border border-line bg-surface p-3"
      aria-label="Gobo rotation and barn doors"
      data-testid="beam-fields"
    >
      <div className="flex flex-col gap-1">
        <h2 className="text-sm font-medium text-ink">Gobo rotation</h2>
        {data.rights.designerNotes ? (
          <div className="flex flex-wrap items-end gap-2">
            <label className="flex flex-col text-xs text-muted">
              Degrees clockwise, looking along the beam (0–359.9)
              <input
                className={input}
                inputMode="decimal"
                value={rotation}
                onChange={(e) => setRotation(e.target.value)}
                aria-invalid={!!errors.goboRotationDeg}
                aria-describedby="gobo-rotation-error"
                data-testid="gobo-rotation"
              />
            </label>
            <Button
              type="button"
              variant="secondary"
              className="min-h-12"
              disabled={pending || rotationValue === (fixture.goboRotationDeg ?? null)}
              onClick={() => void save({ goboRotationDeg: rotationValue })}
            >
              Save rotation
            </Button>
          </div>
        ) : (
          <p className="text-sm">
            {fixture.goboRotationDeg != null ? (
              goboRotationWords(fixture.goboRotationDeg)
            ) : (
              <span className="italic text-muted">{fixture.gobo ? "not recorded" : "no gobo"}</span>
            )}
          </p>
        )}
        <p id="gobo-rotation-error" className="text-sm text-danger" aria-live="polite">
          {errors.goboRotationDeg ?? ""}
        </p>
      </div>
      <div className="flex flex-col gap-1">
        <h2 className="text-sm font-medium text-ink">Barn doors as focused</h2>
        {data.rights.focus ? (
          <>
            <p className="text-xs text-muted">
              Each leaf as seen from behind the unit, in words: “in halfway”, “to the leg”. Doors cut their own side of
              the beam.
            </p>
            <div className="grid grid-cols-2 gap-2">
              {LEAVES.map((l) => (
                <label key={l.key} className="flex flex-col text-xs text-muted">
                  {l.label}
                  <input
                    className={input}
                    maxLength={60}
                    value={leaves[l.key]}
                    onChange={(e) => setLeaves({ ...leaves, [l.key]: e.target.value })}
                    aria-invalid={!!errors[l.key]}
                    data-testid={`barn-door-${l.label.toLowerCase()}`}
                  />
                  {errors[l.key] && <span className="text-sm text-danger">{errors[l.key]}</span>}
                </label>
              ))}
            </div>
            <Button
              type="button"
              variant="secondary"
              className="min-h-12 self-end"
              disabled={pending || !leavesDirty}
              onClick={() =>
                // Only the leaves changed: a leaf someone else set meanwhile is not a conflict unless this one moved too.
                void save(
                  Object.fromEntries(
                    LEAVES.filter((l) => (leaves[l.key].trim() || null) !== (fixture[l.key] ?? null)).map((l) => [
                      l.key,
                      leaves[l.key].trim() || null,
                    ]),
                  ) as FocusPatch,
                )
              }
            >
              Save barn doors
            </Button>
          </>
        ) : (
          <p className="text-sm">{doorsText ?? <span className="italic text-muted">none recorded</span>}</p>
        )}
      </div>
      <div aria-live="polite">{message && <FormMessage message={message.text} tone={message.tone} />}</div>
    </section>
  );
}
