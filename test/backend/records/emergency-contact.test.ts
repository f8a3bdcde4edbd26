/**
 * The emergency contact of a room or site, kept as a line "Emergency contact: ..." in the register
 * notes (no new column) and printed on the door notice. derived: the register's storage rule.
 */
import { describe, expect, it } from 'vitest';
import { emergencyContactFor, emergencyContactIn, withEmergencyContact } from '../../../electron/backend/records/emergency-contact.js';

describe('emergency contact in the register notes', () => {
  const read: ReadonlyArray<readonly [string, string | null]> = [
    ['', null],
    ['Emergency contact: Security, ext. 2222', 'Security, ext. 2222'],
    ['Door code at reception.\nemergency contact :  Control room 2222  ', 'Control room 2222'],
    ['No contact here', null],
  ];
  for (const [notes, contact] of read) it(`${JSON.stringify(notes)} -> ${String(contact)}`, () => expect(emergencyContactIn(notes)).toBe(contact));

  it('the room line wins over the site line; the site line is used when the room has none', () => {
    expect(emergencyContactFor('Emergency contact: Room first-aider 3333', 'Emergency contact: Security 2222')).toBe('Room first-aider 3333');
    expect(emergencyContactFor('no line', 'Emergency contact: Security 2222')).toBe('Security 2222');
  });

  const write: ReadonlyArray<readonly [string, string, string]> = [
    ['', 'Security 2222', 'Emergency contact: Security 2222'],
    ['Door code at reception.', 'Security 2222', 'Door code at reception.\nEmergency contact: Security 2222'],
    ['Door code at reception.\nEmergency contact: old', 'new', 'Door code at reception.\nEmergency contact: new'],
    ['Emergency contact: old\nDoor code at reception.', '', 'Door code at reception.'],
  ];
  for (const [notes, contact, out] of write) it(`set ${JSON.stringify(contact)} in ${JSON.stringify(notes)}`, () => expect(withEmergencyContact(notes, contact)).toBe(out));
});
