import { candidateMeetingDays, meetingReminderDue, reminderZone } from './meeting-reminder';

/**
 * Offsets from the IANA time zone database (tzdata): America/Los_Angeles is UTC−7 from the second
 * Sunday of March 2031 (PDT), Pacific/Kiritimati is UTC+14 all year; a meeting on 2031-03-14.
 */
describe('meetingReminderDue (the day before, in the member’s own time zone)', () => {
  const MEETING = '2031-03-14';

  it('reminds a Los Angeles member on their 13 March, when it is already the 14th in Kiritimati', () => {
    const now = new Date('2031-03-13T17:00:00Z'); // 10:00 on the 13th in Los Angeles, 07:00 on the 14th in Kiritimati
    expect(meetingReminderDue(MEETING, now, 'America/Los_Angeles')).toBeTrue();
    expect(meetingReminderDue(MEETING, now, 'Pacific/Kiritimati')).toBeFalse();
  });

  it('reminds a Kiritimati member on their 13 March, while it is still the 12th in Los Angeles and in UTC', () => {
    const now = new Date('2031-03-12T20:00:00Z'); // 10:00 on the 13th in Kiritimati, 13:00 on the 12th in Los Angeles
    expect(meetingReminderDue(MEETING, now, 'Pacific/Kiritimati')).toBeTrue();
    expect(meetingReminderDue(MEETING, now, 'America/Los_Angeles')).toBeFalse();
    expect(meetingReminderDue(MEETING, now, 'UTC')).toBeFalse();
  });

  it('waits for the morning of the member’s day before', () => {
    expect(meetingReminderDue(MEETING, new Date('2031-03-13T14:00:00Z'), 'America/Los_Angeles')).toBeFalse(); // 07:00 there
    expect(meetingReminderDue(MEETING, new Date('2031-03-13T15:00:00Z'), 'America/Los_Angeles')).toBeTrue(); // 08:00 there
  });

  it('looks up every meeting day some zone may be a day before', () => {
    // At 20:00 UTC on the 12th it is the 13th in Kiritimati (so meetings on the 14th), the 12th in Los Angeles (the 13th).
    const days = candidateMeetingDays(new Date('2031-03-12T20:00:00Z'));
    expect(days).toContain('2031-03-14');
    expect(days).toContain('2031-03-13');
  });

  it('falls back to UTC for a zone nobody knows', () => {
    expect(reminderZone(null, 'Mars/Olympus_Mons', 'Pacific/Kiritimati')).toBe('Pacific/Kiritimati');
    expect(reminderZone(undefined, 'Nowhere/Atlantis')).toBe('UTC');
  });
});
