import { CreateUserAndAuthToken1796161902518 } from './1796161902518-CreateUserAndAuthToken.js';
import { CreateOrganisation1796162415507 } from './1796162415507-CreateOrganisation.js';

/** Every migration, in order; listed as classes (not globs) so tsx, vitest and compiled output agree. */
export const migrations = [CreateUserAndAuthToken1796161902518, CreateOrganisation1796162415507];
