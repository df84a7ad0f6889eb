// The bounds helpers moved into the domain (inserting a design needs them there).
export { axisIndex, boundsCentre, duplicateOffset, partBounds, type Bounds } from '@/domain/design/partBounds';
