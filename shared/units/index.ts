export * from './units';
export * from './length-format';
export * from './fabric-price';
