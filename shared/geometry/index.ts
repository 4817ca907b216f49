export * from './types';
export * from './polygon';
export * from './bezier';
export * from './polyline';
