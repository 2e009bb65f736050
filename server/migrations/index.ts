import { Foundation1796161893549 } from './1796161893549-Foundation.js';
import { Programs1796162374272 } from './1796162374272-Programs.js';
import { RunEvents1796163247780 } from './1796163247780-RunEvents.js';
import { RunPatches1796163491458 } from './1796163491458-RunPatches.js';
import { WorkshopFleet1796163738205 } from './1796163738205-WorkshopFleet.js';
import { ReviewSignOff1796163848909 } from './1796163848909-ReviewSignOff.js';
import { RunEventLeanIndexes1796250000000 } from './1796250000000-RunEventLeanIndexes.js';
import { ReturnsAndVoids1796300000000 } from './1796300000000-ReturnsAndVoids.js';
import { ServiceRecords1796300100000 } from './1796300100000-ServiceRecords.js';
import { SignInFailures1796400000000 } from './1796400000000-SignInFailures.js';
import { OutgoingMail1796400100000 } from './1796400100000-OutgoingMail.js';
import { Accounts1796400200000 } from './1796400200000-Accounts.js';

/** Migrations in the order they run. Add each new file here (the generator does not). */
export const MIGRATIONS: Function[] = [
  Foundation1796161893549,
  Programs1796162374272,
  RunEvents1796163247780,
  RunPatches1796163491458,
  WorkshopFleet1796163738205,
  ReviewSignOff1796163848909,
  RunEventLeanIndexes1796250000000,
  ReturnsAndVoids1796300000000,
  ServiceRecords1796300100000,
  SignInFailures1796400000000,
  OutgoingMail1796400100000,
  Accounts1796400200000,
];
