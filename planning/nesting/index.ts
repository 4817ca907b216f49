export * from './types';
export { nestPieces } from './nest-pieces';
export { checkLayout, type LayoutCheck, type LayoutCheckOptions } from './checker';
