package org.stellabar.eos;

import static org.stellabar.eos.EosQuantities.*;

import java.util.ArrayList;
import java.util.List;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Quantity;
import org.stellabar.table.Summary;

/**
 * Presents an {@link EosState} as a {@link Summary} with the field names of the command-line
 * contract (DESIGN §4), units and one-line meanings, for any writer.
 */
public final class EosStateSummary {

    private EosStateSummary() {
    }

    /**
     * @param state the state
     * @param inputs how the state was asked for, for the metadata
     * @return the summary
     */
    public static Summary of(EosState state, Inputs inputs) {
        Metadata metadata = Metadata.of("gas + radiation equation of state at one point", inputs, List.of(
                "fully ionized classical ideal gas of ions and electrons plus black-body radiation",
                "no degeneracy, pair, Coulomb or partial-ionization corrections; see the warnings"));
        return of(state, metadata, b -> { });
    }

    /**
     * The summary with fields an equation of state adds after the common ones (before the
     * composition and warnings).
     *
     * @param state the state
     * @param metadata what was computed and how it was asked for
     * @param extra adds the model's own fields
     * @return the summary
     */
    public static Summary of(EosState state, Metadata metadata, java.util.function.Consumer<Summary.Builder> extra) {
        Summary.Builder b = new Summary.Builder("eos", metadata)
                .number(RHO, state.rho())
                .number(T, state.T())
                .number(P, state.P())
                .number(P_GAS, state.Pgas())
                .number(P_RAD, state.Prad())
                .number(BETA, state.beta())
                .number(ONE_MINUS_BETA, state.oneMinusBeta())
                .number(U, state.u())
                .number(S, state.s())
                .number(S_PER_BARYON, state.sPerBaryon())
                .number(F, state.f())
                .number(G, state.g())
                .number(CHI_RHO, state.chiRho())
                .number(CHI_T, state.chiT())
                .number(DELTA, state.delta())
                .number(C_V, state.cV())
                .number(C_P, state.cP())
                .number(GAMMA1, state.Gamma1())
                .number(GAMMA2, state.Gamma2())
                .number(GAMMA3, state.Gamma3())
                .number(NABLA_AD, state.nablaAd())
                .number(SOUND_SPEED, state.soundSpeed())
                .number(N_PHOTON, state.photonDensity())
                .number(MEAN_PHOTON_ENERGY, state.meanPhotonEnergy())
                .number(PHOTONS_PER_BARYON, state.photonsPerBaryon());
        extra.accept(b);
        b.nested("composition", composition(state.composition(), metadata), "the mixture")
                .summaries("warnings", warnings(state.warnings(), metadata), "where the idealized physics is doubtful");
        return b.build();
    }

    /**
     * @param c a composition
     * @param metadata metadata to attach
     * @return its summary with fields X, Y, Z, mu, mu_e, mu_i
     */
    public static Summary composition(Composition c, Metadata metadata) {
        Summary.Builder b = new Summary.Builder("composition", metadata)
                .number(implied(X, c), c.X())
                .number(implied(Y, c), c.Y())
                .number(implied(Z, c), c.Z())
                .number(MU, c.mu())
                .number(MU_E, c.muE())
                .number(MU_I, c.muI());
        if (c.metalMassNumber() > 0) {
            b.number(A_Z, c.metalMassNumber());
        }
        return b.build();
    }

    /** A mass fraction that was not given but follows from μ says so. */
    private static Quantity implied(Quantity fraction, Composition c) {
        return c.fromMu() ? fraction.withDescription(fraction.description() + " (implied by mu)") : fraction;
    }

    /**
     * @param warnings validity warnings
     * @param metadata metadata to attach
     * @return one summary {code, message} per warning
     */
    public static List<Summary> warnings(List<ValidityWarning> warnings, Metadata metadata) {
        List<Summary> list = new ArrayList<>();
        for (ValidityWarning w : warnings) {
            list.add(new Summary.Builder("warning", metadata)
                    .text("code", w.code().code(), "stable warning code")
                    .text("message", w.message(), "what is doubtful and why").build());
        }
        return list;
    }
}
