import { describe, expect, it } from 'vitest';
import { formatBytes, isAcceptedImage, photoLabel, thumbSize } from './photo-format';

describe('photo formatting', () => {
  it('when sizes are shown, then decimal units are used', () => {
    expect(formatBytes(950)).toBe('950 B');
    expect(formatBytes(312_400)).toBe('312 kB');
    expect(formatBytes(4_200_000)).toBe('4.2 MB');
    expect(formatBytes(41_000_000)).toBe('41 MB');
  });

  it('when a file is checked, then photos pass, SVG does not, and a blank type falls back to the name', () => {
    expect(isAcceptedImage(new File([], 'a.jpg', { type: 'image/jpeg' }))).toBe(true);
    expect(isAcceptedImage(new File([], 'a.svg', { type: 'image/svg+xml' }))).toBe(false);
    expect(isAcceptedImage(new File([], 'IMG_0001.HEIC', { type: '' }))).toBe(true);
    expect(isAcceptedImage(new File([], 'notes.txt', { type: '' }))).toBe(false);
  });

  it('when a photo is named, then view, phase and caption are given in words', () => {
    expect(photoLabel({ view: 'underside', phase: 'during', caption: 'C15 replaced' })).toBe(
      'Underside, during: C15 replaced',
    );
    expect(photoLabel({ view: 'rear', phase: 'after', caption: '' })).toBe('Rear, after');
  });

  it('when a thumbnail size is worked out, then the long edge is 400 px and the aspect is kept', () => {
    expect(thumbSize({ width: 4000, height: 3000 })).toEqual({ width: 400, height: 300 });
    expect(thumbSize({ width: 3000, height: 4000 })).toEqual({ width: 300, height: 400 });
    expect(thumbSize({ width: 0, height: 0 })).toEqual({ width: 400, height: 300 });
  });
});
