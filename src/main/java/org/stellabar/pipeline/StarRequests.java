package org.stellabar.pipeline;

import org.stellabar.scenario.StarSpec;
import org.stellabar.structure.StarKind;
import org.stellabar.structure.StarRequest;

/** Turns a scenario's star description into a structure request. */
public final class StarRequests {

    private StarRequests() {
    }

    /**
     * @param spec the star as the scenario describes it
     * @return the request for {@link org.stellabar.structure.StarBuilder}
     */
    public static StarRequest of(StarSpec spec) {
        StarKind kind = switch (spec.kind()) {
            case STANDARD -> StarKind.standard;
            case POLYTROPE -> StarKind.polytrope;
            case ISENTROPIC -> StarKind.isentropic;
        };
        double index = kind == StarKind.standard ? 3.0 : spec.index().orElse(Double.NaN);
        return new StarRequest(spec.name(), kind, spec.mass(), spec.radius().orElse(Double.NaN), spec.composition(),
                index, spec.centralTemperature().orElse(Double.NaN), spec.entropyPerBaryon().orElse(Double.NaN),
                spec.points());
    }
}
