// The grouped change list of a revision or a comparison. Server-rendered; a restore button sits on each
// changed fixture or cue when the comparison runs from a revision to the paperwork as it stands.
import { showValue } from "@/lib/revisions/history-lines";
import { CUE_GROUP_WORDS, FIXTURE_GROUP_WORDS, ROW_GROUP_WORDS } from "@/lib/revisions/summary-text";
import type { ChangeLine, RevisionDiff } from "@/lib/revisions/types";
import { RestoreButton } from "./restore-button";

export type RestoreFrom = {
  productionId: number;
  revisionId: number;
  revisionLabel: string;
  fixtureVersions: Record<number, number>;
  cueVersions: Record<number, number>;
};

function Line({ line, restore }: { line: ChangeLine; restore?: React.ReactNode }) {
  return (
    <li className="py-1">
      <span className="font-medium">{line.name}</span>
      {line.changes.length || line.levels?.length ? ": " : null}
      {line.changes.map((c, i) => (
        <span key={c.field}>
          {i ? "; " : ""}
          {c.label} <span className="text-muted line-through decoration-1">{showValue(c.before)}</span> →{" "}
          <span>{showValue(c.after)}</span>
        </span>
      ))}
      {line.levels?.length ? (
        <span>
          {line.changes.length ? "; " : ""}
          {line.levels.map((l) => `ch ${l.channel} ${showValue(l.before)} → ${showValue(l.after)}`).join(", ")}
        </span>
      ) : null}{" "}
      {restore}
    </li>
  );
}

function Group({
  title,
  lines,
  restoreFor,
}: {
  title: string;
  lines: ChangeLine[];
  restoreFor?: (l: ChangeLine) => React.ReactNode;
}) {
  if (!lines.length) return null;
  return (
    <section aria-label={title} className="break-inside-avoid">
      <h3 className="mt-3 text-sm font-semibold">
        {title} <span className="text-muted">({lines.length})</span>
      </h3>
      <ul className="ml-4 list-disc text-sm">
        {lines.map((l) => (
          <Line key={`${title}-${l.id}`} line={l} restore={restoreFor?.(l)} />
        ))}
      </ul>
    </section>
  );
}

export function ChangesList({ diff, restore }: { diff: RevisionDiff; restore?: RestoreFrom }) {
  const button = (entity: "fixture" | "cue") => (l: ChangeLine) => {
    const version = restore ? (entity === "fixture" ? restore.fixtureVersions : restore.cueVersions)[l.id] : undefined;
    if (!restore || version === undefined) return null;
    return (
      <RestoreButton
        productionId={restore.productionId}
        revisionId={restore.revisionId}
        revisionLabel={restore.revisionLabel}
        entity={entity}
        id={l.id}
        version={version}
        name={l.name}
      />
    );
  };
  const groups = [
    ...FIXTURE_GROUP_WORDS.map(([k, title]) => (
      <Group
        key={`f-${k}`}
        title={title}
        lines={diff.fixtures[k]}
        restoreFor={k === "added" || k === "removed" ? undefined : button("fixture")}
      />
    )),
    ...CUE_GROUP_WORDS.map(([k, title]) => (
      <Group
        key={`c-${k}`}
        title={title}
        lines={diff.cues[k]}
        restoreFor={k === "added" || k === "removed" ? undefined : button("cue")}
      />
    )),
    ...ROW_GROUP_WORDS.map(([k, w]) => <Group key={`p-${k}`} title={`Positions ${w}`} lines={diff.positions[k]} />),
    ...ROW_GROUP_WORDS.map(([k, w]) => <Group key={`t-${k}`} title={`Types ${w}`} lines={diff.types[k]} />),
  ];
  const empty = [diff.fixtures, diff.cues, diff.positions, diff.types].every((g) =>
    Object.values(g).every((lines) => (lines as ChangeLine[]).length === 0),
  );
  return empty ? <p className="text-sm text-muted">Nothing on the paperwork has changed.</p> : <div>{groups}</div>;
}
