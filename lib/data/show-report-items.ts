import "server-only";
// The show-report items' model, from the one Sequelize instance's registry: it is set up with the show report
// (models/show-report.ts) rather than listed in models/index.ts, and the registry always holds the set-up class.
import { getDb } from "@/models";
import type { ShowReportItem } from "@/models/show-report";

export const reportItems = () => getDb().sequelize.model("ShowReportItem") as typeof ShowReportItem;
