export * from './cautions';
export * from './instructions';
export * from './labels';
