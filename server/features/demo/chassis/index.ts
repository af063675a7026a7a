export { chassisLandmarks, plainChassisSpot } from './chassis-landmarks';
export type { ChassisView, Landmark } from './chassis-landmarks';
export { chassisSvg, renderChassisJpeg } from './render-chassis';
export type { ChassisState } from './chassis-restoration';
