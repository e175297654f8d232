package org.stellabar.validation;

/** One family of checks: reads its reference tables, computes our values, compares. */
public interface CheckFamily {

    /** @return a short identifier, e.g. "lane-emden" (also the "family:" of its tables) */
    String id();

    /**
     * Runs every check of the family.
     *
     * @param source where the reference tables are
     * @return the results
     * @throws org.stellabar.physics.BadInputException for a malformed or missing table
     */
    FamilyResult run(ReferenceSource source);
}
