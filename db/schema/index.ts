export * from './auth';
export * from './trips';
