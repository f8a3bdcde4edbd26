/**
 * Schema version 5: eyewear upkeep. Each item on the shelf gets the date of its last inspection,
 * the condition found (good / worn / damaged / withdrawn; EN 207 5.x asks the user to check filters
 * and frames for damage before use, and institutions inspect at set intervals: common practice),
 * and the date the next inspection is due, so the Register can remind the officer.
 */
export const name = 'eyewear_upkeep';

export const sql = `
ALTER TABLE eyewear ADD COLUMN inspected_on TEXT;
ALTER TABLE eyewear ADD COLUMN condition TEXT NOT NULL DEFAULT 'not recorded'
  CHECK (condition IN ('not recorded', 'good', 'worn', 'damaged', 'withdrawn'));
ALTER TABLE eyewear ADD COLUMN next_inspection TEXT;
CREATE INDEX eyewear_next_inspection ON eyewear(next_inspection) WHERE next_inspection IS NOT NULL;
`;

/** PostgreSQL: the same columns and index. */
export const postgresql = `
ALTER TABLE eyewear ADD COLUMN inspected_on text;
ALTER TABLE eyewear ADD COLUMN condition text NOT NULL DEFAULT 'not recorded'
  CHECK (condition IN ('not recorded', 'good', 'worn', 'damaged', 'withdrawn'));
ALTER TABLE eyewear ADD COLUMN next_inspection text;
CREATE INDEX eyewear_next_inspection ON eyewear(next_inspection) WHERE next_inspection IS NOT NULL;
`;
