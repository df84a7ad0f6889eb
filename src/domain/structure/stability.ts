/**
 * Tip-over thresholds after the furniture stability standards. Units: mm, N.
 *
 * EN 16122:2012 §11.2 (test methods for storage furniture): units that are, or can be adjusted to,
 * more than 1,000 mm high get a horizontal outward force at the top edge together with a vertical
 * force; units of 1,000 mm or less get only a vertical force 50 mm from the outer edge (read in a
 * public copy of the standard's text). The force values themselves are set by the requirement
 * standards (EN 14749:2016 domestic, EN 16121:2023 non-domestic); Slotwise uses 50 N horizontal
 * (from memory, check the edition that applies to you). ASTM F2057-23 (clothing storage units with
 * drawers, 27 in / 686 mm and taller) hangs a 60 lb (27.2 kg) test weight on an open drawer,
 * raised from 50 lb in F2057-19 (ASTM's own announcement, verified); Slotwise frames have no
 * drawers, so that test is named in the cautions but not run.
 */

/** Frames taller than this (mm) get the horizontal push test (EN 16122:2012 §11.2.2). */
export const PUSH_TEST_MIN_HEIGHT_MM = 1000;
/** Horizontal push at the top edge a free-standing frame must resist, N (EN 14749:2016 level, from memory). */
export const STABILITY_PUSH_FORCE_N = 50;
