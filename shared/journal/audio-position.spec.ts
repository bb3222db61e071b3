import { formatAudioPosition, MAX_AUDIO_SECONDS, parseAudioPosition } from './audio-position';

// 1 min = 60 s and 1 h = 3600 s (SI Brochure, 9th edition, Table 8, non-SI units accepted for use with the SI).
describe('audio positions', () => {
  it('read h:mm:ss, m:ss and plain minutes as seconds', () => {
    expect(parseAudioPosition('1:02:30')).toBe(3600 + 2 * 60 + 30);
    expect(parseAudioPosition(' 0:00:07 ')).toBe(7);
    expect(parseAudioPosition('42:05')).toBe(42 * 60 + 5);
    expect(parseAudioPosition('95:00')).toBe(95 * 60); // players show long tracks as mm:ss past 59
    expect(parseAudioPosition('45')).toBe(45 * 60);
    expect(parseAudioPosition('12:00:00')).toBe(12 * 3600);
  });

  it('refuse what is not a position, or lies past the longest one kept', () => {
    for (const text of ['', 'soon', '1:2:30', '1:60:00', '1:02:60', '1:02:3', '-5', '1.5', '1:02:30:00']) {
      expect(parseAudioPosition(text)).withContext(text).toBeNull();
    }
    expect(parseAudioPosition('333:20:00')).toBe(MAX_AUDIO_SECONDS);
    expect(parseAudioPosition('333:20:01')).toBeNull();
  });

  it('write seconds as h:mm:ss, and read back what they wrote', () => {
    expect(formatAudioPosition(3750)).toBe('1:02:30');
    expect(formatAudioPosition(7)).toBe('0:00:07');
    expect(formatAudioPosition(0)).toBe('0:00:00');
    expect(formatAudioPosition(36 * 3600 + 59)).toBe('36:00:59');
    for (const seconds of [0, 59, 60, 3599, 3600, 86_399, MAX_AUDIO_SECONDS]) {
      expect(parseAudioPosition(formatAudioPosition(seconds))).toBe(seconds);
    }
  });
});
