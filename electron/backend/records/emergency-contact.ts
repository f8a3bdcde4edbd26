/**
 * The emergency contact printed on the door notice, kept in the register without a new column: a
 * line "Emergency contact: ..." in the room's notes, or else in the site's notes (one number for
 * the whole site). The room's line wins, so a room with its own first-aider or control room can say so.
 */
const LINE = /^\s*emergency contact\s*:\s*(.+?)\s*$/im;

export function emergencyContactIn(notes: string): string | null {
  const m = LINE.exec(notes);
  return m?.[1] ?? null;
}

/** The room's emergency contact, else the site's; null when neither names one. */
export function emergencyContactFor(roomNotes: string, siteNotes: string): string | null {
  return emergencyContactIn(roomNotes) ?? emergencyContactIn(siteNotes);
}

/** Notes with the emergency-contact line set to `contact` (added, replaced, or removed when empty). */
export function withEmergencyContact(notes: string, contact: string): string {
  const rest = notes.replace(/^\s*emergency contact\s*:.*(\r?\n)?/im, '').trimEnd();
  const c = contact.trim();
  if (c === '') return rest;
  return rest === '' ? `Emergency contact: ${c}` : `${rest}\nEmergency contact: ${c}`;
}
