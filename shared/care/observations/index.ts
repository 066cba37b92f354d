export * from './vocabulary';
