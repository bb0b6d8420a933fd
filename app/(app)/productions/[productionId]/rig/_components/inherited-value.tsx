import type { FixtureDto } from "@/lib/dto/fixture";
import type { RigColumn, Units } from "@/lib/rig/columns";
import { inheritedText } from "./cell-value";

/** What an empty cell shows: the value in effect, marked as inherited, or a dash where there is none. */
export function EmptyOrInherited({
  column,
  fixture,
  units,
  dash = true,
}: {
  column: RigColumn;
  fixture: FixtureDto;
  units: Units;
  dash?: boolean;
}) {
  const inherited = inheritedText(column.kind, column.id, fixture, units);
  if (!inherited) return dash ? <span className="text-muted print:hidden">–</span> : null;
  return (
    <span
      className="italic text-muted"
      data-testid="inherited-value"
      title={`No value of its own: ${inherited.from === "from type" ? "the type's default" : "worked out from the position's trim"}`}
    >
      {inherited.text} <span className="text-xs not-italic">{inherited.from}</span>
    </span>
  );
}
