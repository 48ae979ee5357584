export * from './part-size';
export * from './format';
export * from './object-keys';
