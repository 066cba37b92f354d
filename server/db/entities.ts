/** Every TypeORM entity, listed explicitly. */
export const entities: Function[] = [];
