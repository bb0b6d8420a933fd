// What a revision is issued for, in a file of its own (no Sequelize) so the browser may import it too.
export const REVISION_PURPOSES = ["bid", "hang", "focus", "tech", "archive"] as const;
export type RevisionPurpose = (typeof REVISION_PURPOSES)[number];
