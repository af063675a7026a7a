import { describe, expect, it } from 'vitest';
import { photoSources } from './photo-sources';

const urls = { thumb: '/t.webp', phone: '/p.webp', display: '/d.webp' };

describe('photoSources', () => {
  it('when a 6000×4000 photo is offered, then each variant is listed at its real width (longest side 400, 1,280 and 2,560 px)', () => {
    // 6000×4000 scaled to fit 400 px: 400×267; 1280: 1280×853; 2560: 2560×1707 (landscape, so the width is the longest side).
    expect(photoSources({ width: 6000, height: 4000, urls }, '100vw')).toEqual({
      src: '/p.webp',
      srcSet: '/t.webp 400w, /p.webp 1280w, /d.webp 2560w',
      sizes: '100vw',
    });
  });

  it('when the photo is portrait, then the widths follow its shorter side', () => {
    // 3000×4000: 400/4000 of 3000 = 300; 1280/4000 of 3000 = 960; 2560/4000 of 3000 = 1920.
    expect(photoSources({ width: 3000, height: 4000, urls }, '50vw').srcSet).toBe(
      '/t.webp 300w, /p.webp 960w, /d.webp 1920w',
    );
  });

  it('when the original is smaller than the larger variants, then a width is offered once, by its smallest file', () => {
    // 1000×800: the thumbnail is 400 wide; the phone and display variants are not enlarged, both 1000 wide.
    expect(photoSources({ width: 1000, height: 800, urls }, '100vw').srcSet).toBe('/t.webp 400w, /p.webp 1000w');
  });
});
