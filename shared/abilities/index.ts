export * from './define-abilities';
export * from './subjects';
