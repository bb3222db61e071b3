/** The latest audio position a quote may hold, in seconds (the `quotes` schema's bound, 333 h 20 min). */
export const MAX_AUDIO_SECONDS = 1_200_000;

/**
 * Reads an audio position as the reader types it: `h:mm:ss` ("1:02:30"), `m:ss` ("42:05", minutes
 * may run past 59 as players show them), or a whole number of minutes ("45"). Returns whole
 * seconds, or `null` when the text is none of these or lies beyond {@link MAX_AUDIO_SECONDS}.
 *
 * @example
 * parseAudioPosition('1:02:30') // 3750
 */
export function parseAudioPosition(text: string): number | null {
  const typed = text.trim();
  let seconds: number;
  const minutesOnly = /^(\d{1,5})$/.exec(typed);
  const clock = /^(?:(\d{1,3}):([0-5]\d)|(\d{1,5})):([0-5]\d)$/.exec(typed);
  if (minutesOnly) seconds = Number(minutesOnly[1]) * 60;
  else if (clock) {
    const [, hours, minutesAfterHours, minutes, secs] = clock;
    seconds = hours !== undefined ? Number(hours) * 3600 + Number(minutesAfterHours) * 60 + Number(secs) : Number(minutes) * 60 + Number(secs);
  } else return null;
  return seconds <= MAX_AUDIO_SECONDS ? seconds : null;
}

/**
 * An audio position as `h:mm:ss`, the way players show it.
 *
 * @example
 * formatAudioPosition(3750) // '1:02:30'
 */
export function formatAudioPosition(seconds: number): string {
  const whole = Math.max(0, Math.floor(seconds));
  const two = (n: number) => String(n).padStart(2, '0');
  return `${Math.floor(whole / 3600)}:${two(Math.floor((whole % 3600) / 60))}:${two(whole % 60)}`;
}
