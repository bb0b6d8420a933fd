import "server-only";
// React elements to static HTML for the PDF's print pages. Route handlers are bundled for React Server
// Components, where react-dom/server refuses to load, so Node's own copy is loaded at run time, outside the
// bundle (process.getBuiltinModule hides the require from the bundler). The components it renders are plain
// functions of their props (no hooks, no context), so elements made by the bundled React render the same;
// React escapes every text and attribute, so no chart text can turn into markup or script.
import type { ReactElement } from "react";

type Render = (element: ReactElement) => string;
let render: Render | null = null;

function loadRenderer(): Render {
  const { createRequire } = process.getBuiltinModule("node:module") as typeof import("node:module");
  const load = createRequire(`${process.cwd()}/package.json`);
  return (load("react-dom/server") as typeof import("react-dom/server")).renderToStaticMarkup;
}

export function renderStaticMarkup(element: ReactElement): string {
  render ??= loadRenderer();
  return render(element);
}
