/** Viewer tools any feature can add as DesignViewer children: section plane, measure, dimensions, point picks. */
export { SectionPlane, type SectionAxis } from './SectionPlane';
export { MeasureTool, distanceMm } from './MeasureTool';
export { OverallDimensions } from './OverallDimensions';
export { usePointPick, type PickedPoint } from './usePointPick';
