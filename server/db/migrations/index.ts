import { CreateUserAndAuthToken1796161902518 } from './1796161902518-CreateUserAndAuthToken.js';
import { CreateOrganisation1796162415507 } from './1796162415507-CreateOrganisation.js';
import { CreateSite1796162470126 } from './1796162470126-CreateSite.js';
import { AddWindowWeights1796163225373 } from './1796163225373-AddWindowWeights.js';
import { CreateWorkday1796163241140 } from './1796163241140-CreateWorkday.js';
import { AddCrews1796163517092 } from './1796163517092-AddCrews.js';
import { AddNursery1796165257564 } from './1796165257564-AddNursery.js';
import { AddFleet1796169076314 } from './1796169076314-AddFleet.js';
import { AddGivingAndOutcomes1796170127221 } from './1796170127221-AddGivingAndOutcomes.js';

/** Every migration, in order; listed as classes (not globs) so tsx, vitest and compiled output agree. */
export const migrations = [CreateUserAndAuthToken1796161902518, CreateOrganisation1796162415507, CreateSite1796162470126, AddWindowWeights1796163225373, CreateWorkday1796163241140, AddCrews1796163517092, AddNursery1796165257564, AddFleet1796169076314, AddGivingAndOutcomes1796170127221];
