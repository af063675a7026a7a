export * from './currency';
export * from './rounding';
export * from './tax';
export * from './totals';
export * from './estimate-range';
export * from './invoice-status';
