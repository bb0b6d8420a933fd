/** How a long import reports where it is (the route streams these to the browser). A file of its own so the
 * reader and the writer can both name it without importing each other. */
export type Progress = (stage: "reading" | "checking" | "writing", done: number, total: number) => void;
