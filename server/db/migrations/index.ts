import { CreateUserAndAuthToken1796161902518 } from './1796161902518-CreateUserAndAuthToken.js';

/** Every migration, in order; listed as classes (not globs) so tsx, vitest and compiled output agree. */
export const migrations = [CreateUserAndAuthToken1796161902518];
