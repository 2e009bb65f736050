import type { ServiceInterval } from '../service/service.schema';
import { FIRST_SERVICE_DEFAULT } from '../service/service.schema';

/** Every built-in program says where it comes from and what comes before it. */
export const BUILT_IN_SOURCE =
  'Common practice, written by Ringseat in its own words. The maker\u2019s manual for your engine comes first: where it differs from this program, follow the manual.';

/** 20 h or 1 month, whichever first (common practice; BoatUS "Long Life – Outboard Maintenance"). */
export const BUILT_IN_FIRST_SERVICE: ServiceInterval = FIRST_SERVICE_DEFAULT;

/** Words for the workshop's first run at the dock, where people get hurt if care slips. */
export const DOCK_RUN_CAUTION =
  'Moor the boat securely, keep the gear in neutral unless the test needs it, clip on the kill-switch lanyard, check the cooling-water tell-tale within a minute of starting and keep clear of exhaust fumes.';
