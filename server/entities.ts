import { Program } from './features/programs/program.entity.js';
import { RunEventRow } from './features/runs/run-event.entity.js';
import { Run } from './features/runs/run.entity.js';
import { ChangeCounter } from './features/sync/change-counter.entity.js';
import { RunPatchRow } from './features/sync/run-patch.entity.js';
import { Session } from './features/auth/session.entity.js';
import { Invite } from './features/users/invite.entity.js';
import { User } from './features/users/user.entity.js';
import { Engine } from './features/vessels/engine.entity.js';
import { VesselSkipper } from './features/vessels/vessel-skipper.entity.js';
import { Vessel } from './features/vessels/vessel.entity.js';
import { Workshop } from './features/workshops/workshop.entity.js';

/** Every entity of the schema; the data source and the migration generator both use this list. */
export const ENTITIES = [Workshop, User, Session, Invite, Vessel, VesselSkipper, Engine, Program, Run, RunEventRow, ChangeCounter, RunPatchRow];
