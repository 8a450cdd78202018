/**
 * Smallest clearance per side, in mm, that FDM prints reliably; below it Seamwright warns.
 * Issue 3 sets it; it is also the bottom of the lowest published press range (REFERENCES §7.2, 0.05–0.1 mm).
 */
export const FDM_MIN_RELIABLE_CLEARANCE_MM = 0.05;

/**
 * Largest clearance per side, in mm, that still aligns parts; above it Seamwright warns (any process).
 * Issue 3 sets it; it is also the top of the published loose range (REFERENCES §7.2, 0.3–0.5 mm).
 */
export const MAX_RELIABLE_CLEARANCE_MM = 0.5;
