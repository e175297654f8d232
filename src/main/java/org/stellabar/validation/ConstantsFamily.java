package org.stellabar.validation;

import static org.stellabar.physics.Constants.ATOMIC_MASS_UNIT;
import static org.stellabar.physics.Constants.BOLTZMANN;
import static org.stellabar.physics.Constants.ELECTRONVOLT;
import static org.stellabar.physics.Constants.ELECTRON_MASS;
import static org.stellabar.physics.Constants.PLANCK;
import static org.stellabar.physics.Constants.SOLAR_LUMINOSITY;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;
import static org.stellabar.physics.Constants.SPEED_OF_LIGHT;
import static org.stellabar.physics.Constants.STEFAN_BOLTZMANN;

import java.util.List;
import org.stellabar.physics.Constants;

/**
 * stellabar's constants, as defined or derived in {@link Constants}, against CODATA 2018 and the
 * IAU 2015 nominal solar values. Derived rows (σ, hc/k, rest energies, T_eff☉) test the
 * derivations, not only the typing.
 */
public final class ConstantsFamily implements CheckFamily {

    /** The family's identifier. */
    public static final String ID = "constants";
    /** Its reference table. */
    public static final List<String> FILES = List.of("constants.csv");

    private static final String KNOWN = "boltzmann, planck, speed_of_light, elementary_charge_si, gravitation, "
            + "atomic_mass_unit, electron_mass, proton_mass, stefan_boltzmann, second_radiation_constant, "
            + "electron_rest_energy, atomic_mass_unit_rest_energy, solar_radius, solar_luminosity, "
            + "solar_mass_parameter, solar_effective_temperature, solar_mass, astronomical_unit";
    private static final double MEV = 1e6 * ELECTRONVOLT;

    @Override
    public String id() {
        return ID;
    }

    @Override
    public FamilyResult run(ReferenceSource source) {
        return TableChecks.run(ID, "Physical constants and nominal solar values", source, FILES,
                tables -> ConstantsFamily::ours, TableChecks.NO_CHARTS,
                "Our values: the fields of `org.stellabar.physics.Constants`; derived rows computed from them: "
                        + "σ as stellabar derives it from k, h, c; c₂ = hc/k; rest energies m c²/(1 MeV); "
                        + "T_eff☉ = (L☉/(4πR☉²σ))^(1/4); M☉ = GM☉/G.");
    }

    private static double ours(ReferenceValue row) {
        return switch (row.quantity()) {
            case "boltzmann" -> BOLTZMANN;
            case "planck" -> PLANCK;
            case "speed_of_light" -> SPEED_OF_LIGHT;
            case "elementary_charge_si" -> Constants.ELEMENTARY_CHARGE_SI;
            case "gravitation" -> Constants.GRAVITATION;
            case "atomic_mass_unit" -> ATOMIC_MASS_UNIT;
            case "electron_mass" -> ELECTRON_MASS;
            case "proton_mass" -> Constants.PROTON_MASS;
            case "stefan_boltzmann" -> STEFAN_BOLTZMANN;
            case "second_radiation_constant" -> PLANCK * SPEED_OF_LIGHT / BOLTZMANN;
            case "electron_rest_energy" -> ELECTRON_MASS * SPEED_OF_LIGHT * SPEED_OF_LIGHT / MEV;
            case "atomic_mass_unit_rest_energy" -> ATOMIC_MASS_UNIT * SPEED_OF_LIGHT * SPEED_OF_LIGHT / MEV;
            case "solar_radius" -> SOLAR_RADIUS;
            case "solar_luminosity" -> SOLAR_LUMINOSITY;
            case "solar_mass_parameter" -> Constants.SOLAR_MASS_PARAMETER;
            case "solar_effective_temperature" -> Math.sqrt(Math.sqrt(
                    SOLAR_LUMINOSITY / (4.0 * Math.PI * SOLAR_RADIUS * SOLAR_RADIUS * STEFAN_BOLTZMANN)));
            case "solar_mass" -> Constants.SOLAR_MASS;
            case "astronomical_unit" -> Constants.ASTRONOMICAL_UNIT;
            default -> throw TableChecks.unknownQuantity(row, ID, KNOWN);
        };
    }
}
