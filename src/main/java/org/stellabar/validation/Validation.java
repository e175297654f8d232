package org.stellabar.validation;

import java.util.ArrayList;
import java.util.List;

/**
 * Runs every family of checks: the published and computed reference tables in
 * {@code validation/*.csv} and the thermodynamic identities.
 */
public final class Validation {

    private final List<CheckFamily> families;

    /** @param families the families, in report order */
    public Validation(List<CheckFamily> families) {
        this.families = List.copyOf(families);
    }

    /** @return every family stellabar checks, in report order */
    public static Validation standard() {
        return new Validation(List.of(new ConstantsFamily(), new PhotonGasFamily(), new MixtureExponentFamily(),
                new ThermodynamicIdentityFamily(), new LaneEmdenFamily(), new StandardModelFamily(),
                new StabilityConstantFamily(), new FermiFamily()));
    }

    /** @return the families, in report order */
    public List<CheckFamily> families() {
        return families;
    }

    /**
     * @param source where the reference tables are
     * @return the results
     * @throws org.stellabar.physics.BadInputException for a malformed or missing table
     */
    public ValidationReport run(ReferenceSource source) {
        List<FamilyResult> results = new ArrayList<>();
        for (CheckFamily family : families) {
            results.add(family.run(source));
        }
        return new ValidationReport(results);
    }
}
