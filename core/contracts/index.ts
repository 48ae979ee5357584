export * from './common';
export * from './auth';
export * from './classes';
export * from './departments';
export * from './people';
export * from './school';
export * from './recordings';
