/**
 * Exact definitions every conversion in Ringseat is built from. Derived values are computed
 * from these, never typed in, so a rounding slip cannot creep in.
 */

/** International Hydrographic Conference, Monaco 1929; BIPM SI Brochure 8th ed. 2006, Table 8. */
export const NAUTICAL_MILE_M = 1852;

/** International Yard and Pound Agreement 1959. */
export const INCH_M = 0.0254;

/** International Yard and Pound Agreement 1959 (1 lb = 0.45359237 kg); NIST SP 811 (2008), Appendix B. */
export const POUND_KG = 0.45359237;

/** 231 in³: NIST Handbook 44, Appendix C; NIST SP 811 (2008), Appendix B. */
export const US_GALLON_L = 3.785411784;

/** Foot = 0.3048 m (International Yard and Pound Agreement 1959). */
export const FOOT_M = 0.3048;

/** Standard acceleration of gravity, m/s² (3rd CGPM 1901; NIST SP 811 (2008), Appendix B). */
export const STANDARD_GRAVITY_M_PER_S2 = 9.80665;

/**
 * Mechanical horsepower = 550 ft·lbf/s = 745.69987158227022 W (NIST SP 811 (2008), Appendix B).
 * Built from its definition: the 17-digit figure is more than a double can hold, and this
 * product is the nearest double to it.
 */
export const HORSEPOWER_W = 550 * FOOT_M * POUND_KG * STANDARD_GRAVITY_M_PER_S2;

/** Statute mile = 63,360 in (International Yard and Pound Agreement 1959). */
export const STATUTE_MILE_M = 63_360 * INCH_M;

const SECONDS_PER_HOUR = 3600;

/** Knot = one nautical mile per hour, from the nautical mile. */
export const KNOT_M_PER_S = NAUTICAL_MILE_M / SECONDS_PER_HOUR;
export const KM_PER_H_M_PER_S = 1000 / SECONDS_PER_HOUR;
export const MPH_M_PER_S = STATUTE_MILE_M / SECONDS_PER_HOUR;
