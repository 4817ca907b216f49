export * from './units';
export * from './length-format';
