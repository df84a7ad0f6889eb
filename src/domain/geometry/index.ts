export * from './vectors';
export * from './box';
export * from './profileGeometry';
export * from './panelGeometry';
export * from './spatialGrid';
export * from './cornerNotches';
