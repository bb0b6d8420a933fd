import "server-only";
// The PDF's focus sheets as HTML, one string a sheet so a long print can be sent to the browser in parts:
// the same React components as the screen and the browser's print view, rendered to static markup.
import { createElement } from "react";
import { EmptySheet, FocusSheet, type SheetOptions } from "@/components/focus/focus-sheets";
import type { Sheet } from "@/lib/focus/pages";
import { renderStaticMarkup } from "./static-markup";

export type { SheetOptions };

export function focusSheetsMarkup(sheets: Sheet[], o: SheetOptions): string[] {
  if (!sheets.length) return [renderStaticMarkup(createElement(EmptySheet, { perPage: o.perPage }))];
  return sheets.map((sheet) => renderStaticMarkup(createElement(FocusSheet, { sheet, o })));
}
