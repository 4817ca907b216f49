export * from './cut-orders';
export * from './line-balancing';
export * from './line-staffing';
export * from './capacity';
export * from './costing';
export * from './bundles';
export * from './floor';
export * from './nesting';
