/** A safe download name: "focus-charts-salt-and-lantern.pdf". */
export function attachmentName(productionName: string, ext: string): string {
  const slug = productionName.toLowerCase().normalize("NFKD").replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "").slice(0, 60) || "production";
  return `focus-charts-${slug}.${ext}`;
}
