export { whatToCheckNext, CHECK_ORDER } from './what-to-check';
export { WATER_CHECK_RULES } from './water-rules';
export { ANIMAL_CHECK_RULES, ASK_MENTOR_AND_VET } from './animal-rules';
export * from './types';
