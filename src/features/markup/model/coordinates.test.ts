import { describe, expect, it } from 'vitest';
import {
  actualSize,
  clampPan,
  fitTransform,
  focusOn,
  imagePoint,
  imageToStage,
  pan,
  pinchZoom,
  stagePoint,
  stageToImage,
  zoomAt,
  zoomLimits,
  type ImageSize,
  type StagePoint,
  type ViewTransform,
} from './coordinates';

const landscape: ImageSize = { width: 4000, height: 3000 };
const portrait: ImageSize = { width: 3000, height: 4000 };
const phone = { width: 390, height: 844 };
const screen4k = { width: 3840, height: 2160 };

function expectPoint(actual: { x: number; y: number }, expected: { x: number; y: number }, digits = 9) {
  expect(actual.x).toBeCloseTo(expected.x, digits);
  expect(actual.y).toBeCloseTo(expected.y, digits);
}

describe('stageToImage and imageToStage', () => {
  const views: ViewTransform[] = [
    { scale: 1, x: 0, y: 0 },
    { scale: 0.0895, x: 16, y: 287.75 },
    { scale: 7.3, x: -12345.6, y: -987.1 },
  ];
  const images: ImageSize[] = [landscape, portrait, { width: 1, height: 1 }];

  it('when an image point goes to the stage and back, then it returns within 1e-9', () => {
    for (const view of views)
      for (const image of images)
        for (const p of [
          imagePoint(0, 0),
          imagePoint(1, 1),
          imagePoint(0.123456789, 0.987654321),
          imagePoint(0.5, 0.25),
        ]) {
          const back = stageToImage(imageToStage(p, view, image), view, image);
          expect(Math.abs(back.x - p.x)).toBeLessThan(1e-9);
          expect(Math.abs(back.y - p.y)).toBeLessThan(1e-9);
        }
  });

  it('when a stage point goes to the image and back, then it returns within 1e-9', () => {
    for (const view of views)
      for (const image of images) {
        const p = stagePoint(201.5, -33.25);
        const back = imageToStage(stageToImage(p, view, image), view, image);
        expect(Math.abs(back.x - p.x)).toBeLessThan(1e-9);
        expect(Math.abs(back.y - p.y)).toBeLessThan(1e-9);
      }
  });

  it('when the image corner sits at the view offset, then normalised (0,0) lands there and (1,1) one scaled image away', () => {
    const view = { scale: 2, x: 10, y: 20 };
    expectPoint(imageToStage(imagePoint(0, 0), view, landscape), { x: 10, y: 20 });
    expectPoint(imageToStage(imagePoint(1, 1), view, landscape), { x: 8010, y: 6020 });
  });
});

describe('fitTransform', () => {
  // Worked by hand: scale = min((stage w − 2·16) / image w, (stage h − 2·16) / image h), then centred.
  it.each([
    ['a landscape photo on a phone', landscape, phone, { scale: 358 / 4000, x: 16, y: (844 - 268.5) / 2 }],
    ['a portrait photo on a phone', portrait, phone, { scale: 358 / 3000, x: 16, y: (844 - 4000 * (358 / 3000)) / 2 }],
    [
      'a landscape photo on a 4K screen',
      landscape,
      screen4k,
      { scale: 2128 / 3000, x: (3840 - 4000 * (2128 / 3000)) / 2, y: 16 },
    ],
    ['a portrait photo on a 4K screen', portrait, screen4k, { scale: 2128 / 4000, x: (3840 - 1596) / 2, y: 16 }],
  ])('when fitting %s, then the whole photo shows, centred, inside the padding', (_name, image, stage, expected) => {
    const view = fitTransform(image, stage, 16);
    expect(view.scale).toBeCloseTo(expected.scale, 9);
    expectPoint(view, expected);
    const topLeft = imageToStage(imagePoint(0, 0), view, image);
    const bottomRight = imageToStage(imagePoint(1, 1), view, image);
    expect(Math.min(topLeft.x, topLeft.y)).toBeGreaterThanOrEqual(16 - 1e-9);
    expect(bottomRight.x).toBeLessThanOrEqual(stage.width - 16 + 1e-9);
    expect(bottomRight.y).toBeLessThanOrEqual(stage.height - 16 + 1e-9);
    expectPoint(imageToStage(imagePoint(0.5, 0.5), view, image), { x: stage.width / 2, y: stage.height / 2 });
  });

  it('when the padding is larger than the stage allows, then at most a quarter of the stage goes to padding', () => {
    const view = fitTransform({ width: 100, height: 100 }, { width: 40, height: 40 }, 100);
    expect(view.scale).toBeCloseTo(0.2, 12);
  });
});

describe('actualSize', () => {
  it('when shown at actual size, then one image px is one stage px and the focus is at the stage centre', () => {
    const view = actualSize(landscape, phone, imagePoint(0.25, 0.75));
    expect(view.scale).toBe(1);
    expectPoint(imageToStage(imagePoint(0.25, 0.75), view, landscape), { x: 195, y: 422 });
  });

  it('when no focus is given, then the image centre is at the stage centre', () => {
    expectPoint(imageToStage(imagePoint(0.5, 0.5), actualSize(portrait, screen4k), portrait), { x: 1920, y: 1080 });
  });
});

describe('zoomAt and zoomLimits', () => {
  const limits = zoomLimits(landscape, phone);
  const view = fitTransform(landscape, phone);

  it('when zoomed at a stage point, then the image point under it stays under it', () => {
    const cursor = stagePoint(120, 400);
    const before = stageToImage(cursor, view, landscape);
    const zoomed = zoomAt(view, cursor, 3, limits);
    expect(zoomed.scale).toBeCloseTo(view.scale * 3, 12);
    expectPoint(stageToImage(cursor, zoomed, landscape), before);
  });

  it('when zoomed far in or out, then the scale stops at 8× actual size and at half the fit, point still fixed', () => {
    const cursor = stagePoint(300, 100);
    const before = stageToImage(cursor, view, landscape);
    const inMost = zoomAt(view, cursor, 1e6, limits);
    expect(inMost.scale).toBe(8);
    expectPoint(stageToImage(cursor, inMost, landscape), before);
    expect(zoomAt(view, cursor, 1e-6, limits).scale).toBeCloseTo(view.scale / 2, 12);
  });

  it('when the photo is smaller than the stage, then the limits still reach the fit scale', () => {
    const tiny = zoomLimits({ width: 40, height: 30 }, screen4k);
    const fit = fitTransform({ width: 40, height: 30 }, screen4k).scale;
    expect(tiny.max).toBeCloseTo(fit, 12);
    expect(tiny.min).toBeCloseTo(fit / 2, 12);
  });
});

describe('pinchZoom', () => {
  const view: ViewTransform = { scale: 1, x: 0, y: 0 };
  const pair = (a: [number, number], b: [number, number]): [StagePoint, StagePoint] => [
    stagePoint(...a),
    stagePoint(...b),
  ];

  it('when two fingers spread to twice their distance about a still midpoint, then the scale doubles around it', () => {
    const next = pinchZoom(view, pair([90, 100], [110, 100]), pair([80, 100], [120, 100]));
    expect(next.scale).toBeCloseTo(2, 12);
    expectPoint(
      stageToImage(stagePoint(100, 100), next, landscape),
      stageToImage(stagePoint(100, 100), view, landscape),
    );
  });

  it('when two fingers move together without spreading, then the image pans with them', () => {
    const next = pinchZoom(view, pair([0, 0], [10, 0]), pair([30, 40], [40, 40]));
    expect(next).toEqual({ scale: 1, x: 30, y: 40 });
  });

  it('when the spread and the move combine, then the image point under the old midpoint is under the new one', () => {
    const prev = pair([100, 100], [200, 200]);
    const next = pair([300, 50], [600, 350]);
    const zoomed = pinchZoom(view, prev, next);
    expect(zoomed.scale).toBeCloseTo(3, 12);
    expectPoint(imageToStage(stageToImage(stagePoint(150, 150), view, landscape), zoomed, landscape), {
      x: 450,
      y: 200,
    });
  });

  it('when limits are given, then the pinch stops at them', () => {
    expect(pinchZoom(view, pair([0, 0], [1, 0]), pair([0, 0], [100, 0]), { min: 0.5, max: 8 }).scale).toBe(8);
  });
});

describe('pan and clampPan', () => {
  const view: ViewTransform = { scale: 0.1, x: 0, y: 0 }; // the 4000×3000 photo is 400×300 stage px

  it('when panned, then the offset moves by the stage px given', () => {
    expect(pan(view, 12, -5)).toEqual({ scale: 0.1, x: 12, y: -5 });
  });

  it('when panned almost off the stage, then 64 stage px of the photo remain on each side', () => {
    expect(clampPan(pan(view, 5000, 5000), landscape, phone)).toMatchObject({ x: 390 - 64, y: 844 - 64 });
    expect(clampPan(pan(view, -5000, -5000), landscape, phone)).toMatchObject({ x: 64 - 400, y: 64 - 300 });
  });

  it('when panned within bounds, then the view is untouched', () => {
    expect(clampPan(pan(view, -10, 100), landscape, phone)).toEqual({ scale: 0.1, x: -10, y: 100 });
  });

  it('when the photo on screen is narrower than the margin, then all of it stays on the stage', () => {
    const small = clampPan({ scale: 0.01, x: -1000, y: 5000 }, landscape, phone); // 40×30 stage px
    expect(small).toMatchObject({ x: 0, y: 844 - 30 });
  });
});

describe('focusOn', () => {
  const view = fitTransform(landscape, phone);

  it('when focusing on a finding’s bounds, then they fill half the stage, centred', () => {
    // 400×300 image px; half the phone stage is 195×422, so the width decides: 195 / 400.
    const focused = focusOn(view, landscape, phone, { minX: 0.1, minY: 0.2, maxX: 0.2, maxY: 0.3 });
    expect(focused.scale).toBeCloseTo(195 / 400, 12);
    expectPoint(imageToStage(imagePoint(0.15, 0.25), focused, landscape), { x: 195, y: 422 });
  });

  it('when the bounds have no size, then the zoom stops at 2× actual size', () => {
    expect(focusOn(view, landscape, phone, { minX: 0.4, minY: 0.4, maxX: 0.4, maxY: 0.4 }).scale).toBe(2);
  });

  it('when focusing on a point from the fitted view, then it is centred at actual size', () => {
    const focused = focusOn(view, landscape, phone, imagePoint(0.9, 0.1));
    expect(focused.scale).toBe(1);
    expectPoint(imageToStage(imagePoint(0.9, 0.1), focused, landscape), { x: 195, y: 422 });
  });

  it('when a zoom is given, then it is used within the limits', () => {
    expect(focusOn(view, landscape, phone, imagePoint(0.5, 0.5), 4).scale).toBe(4);
    expect(focusOn(view, landscape, phone, imagePoint(0.5, 0.5), 40).scale).toBe(8);
  });
});
