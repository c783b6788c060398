export * from './app';
export * from './auth';
