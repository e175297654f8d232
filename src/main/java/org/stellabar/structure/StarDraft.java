package org.stellabar.structure;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;
import org.stellabar.eos.Composition;
import org.stellabar.eos.Electrons;
import org.stellabar.structure.StarRequestException.Component;
import org.stellabar.structure.StarRequestException.Problem;
import org.stellabar.structure.StarRequestException.Violation;

/**
 * A star as the user wrote it, before validation: the kind and whichever inputs were given, from
 * command-line options or a scenario file alike. {@link #toRequest()} is the one place that
 * decides which inputs a kind takes and turns them into the kind's {@link StarRequest} record,
 * reporting every problem at once (inputs a kind needs and lacks, inputs it does not take, a
 * second anchor of an isentropic star, and every value rule of {@link StarRequestRules}).
 *
 * @param name label for titles and file names
 * @param kind the kind of model
 * @param mass M [g]
 * @param radius R [cm], if given
 * @param index polytropic index n, if given
 * @param centralTemperature T_c [K], if given
 * @param entropyPerBaryon s m_u/k_B, if given
 * @param anchorOrder the isentropic anchors (radius, centralTemperature, entropy) in the order
 *     the user wrote them: the first counts, later ones conflict with it; may list components
 *     not given, which are skipped
 * @param composition the mixture
 * @param points profile rows
 * @param electrons which equation of state treats the electrons
 */
public record StarDraft(String name, StarKind kind, double mass, OptionalDouble radius, OptionalDouble index,
        OptionalDouble centralTemperature, OptionalDouble entropyPerBaryon, List<Component> anchorOrder,
        Composition composition, long points, Electrons electrons) {

    /** The anchors in the order the command line lists them. */
    public static final List<Component> ANCHORS = List.of(Component.radius, Component.centralTemperature,
            Component.entropy);

    /**
     * Canonical constructor: no component may be null; copies collections in; fills defaults for absent parts.
     *
     * @param name label for titles and file names
     * @param kind the kind of model
     * @param mass M [g]
     * @param radius R [cm], if given
     * @param index polytropic index n, if given
     * @param centralTemperature T_c [K], if given
     * @param entropyPerBaryon s m_u/k_B, if given
     * @param anchorOrder the isentropic anchors (radius, centralTemperature, entropy) in the order
     *        the user wrote them: the first counts, later ones conflict with it; may list components
     *        not given, which are skipped
     * @param composition the mixture
     * @param points profile rows
     * @param electrons which equation of state treats the electrons
     */
    public StarDraft {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(composition, "composition");
        Objects.requireNonNull(electrons, "electrons");
        radius = radius == null ? OptionalDouble.empty() : radius;
        index = index == null ? OptionalDouble.empty() : index;
        centralTemperature = centralTemperature == null ? OptionalDouble.empty() : centralTemperature;
        entropyPerBaryon = entropyPerBaryon == null ? OptionalDouble.empty() : entropyPerBaryon;
        anchorOrder = anchorOrder == null ? ANCHORS : List.copyOf(anchorOrder);
    }

    /**
     * A draft of a star on the classical mixture.
     *
     * @param name label
     * @param kind the kind
     * @param mass M [g]
     * @param radius R [cm], if given
     * @param index n, if given
     * @param centralTemperature T_c [K], if given
     * @param entropyPerBaryon s m_u/k_B, if given
     * @param anchorOrder the isentropic anchors in the order written
     * @param composition the mixture
     * @param points profile rows
     */
    public StarDraft(String name, StarKind kind, double mass, OptionalDouble radius, OptionalDouble index,
            OptionalDouble centralTemperature, OptionalDouble entropyPerBaryon, List<Component> anchorOrder,
            Composition composition, long points) {
        this(name, kind, mass, radius, index, centralTemperature, entropyPerBaryon, anchorOrder, composition, points,
                Electrons.classical);
    }

    /**
     * @return the validated request
     * @throws StarRequestException with every problem found
     */
    public StarRequest toRequest() {
        StarRequestRules rules = StarRequestRules.check().mass(mass).points(points);
        index.ifPresent(rules::index);
        radius.ifPresent(r -> rules.radius(r, mass));
        centralTemperature.ifPresent(rules::centralTemperature);
        entropyPerBaryon.ifPresent(rules::entropy);
        if (kind == StarKind.standard && electrons != Electrons.classical) {
            rules.add(new Violation(Component.electrons, Problem.NOT_APPLICABLE, "electrons " + electrons
                    + " do not apply to the standard model, whose constant beta comes from Eddington's quartic for"
                    + " classical electrons; use kind polytrope with index 3 (T and beta by inversion of the " + electrons
                    + " EOS) or kind isentropic"));
        }
        switch (kind) {
            case standard, polytrope -> scaledByRadius(rules);
            case isentropic -> isentropic(rules);
            default -> throw new IllegalStateException("unknown kind " + kind);
        }
        rules.throwIfAny();
        return switch (kind) {
            case standard -> new StandardModelRequest(name, mass, radius.getAsDouble(), composition, (int) points);
            case polytrope -> new PolytropeRequest(name, mass, radius.getAsDouble(), index.getAsDouble(), composition,
                    (int) points, electrons);
            case isentropic -> new IsentropicRequest(name, mass, givenAnchors().get(0), composition, (int) points,
                    electrons);
        };
    }

    /** Standard model and polytrope: fixed by M and R; an index for the polytrope only. */
    private void scaledByRadius(StarRequestRules rules) {
        if (kind == StarKind.polytrope && index.isEmpty()) {
            rules.add(new Violation(Component.index, Problem.MISSING,
                    "a polytrope needs its index n; none was given (allowed 0 <= n < 5)"));
        }
        if (kind == StarKind.standard && index.isPresent()) {
            rules.add(new Violation(Component.index, Problem.NOT_APPLICABLE, "polytropic index n = "
                    + index.getAsDouble() + " does not apply to the standard model, which is n = 3 by construction;"
                    + " use kind polytrope for another n"));
        }
        if (radius.isEmpty()) {
            rules.add(new Violation(Component.radius, Problem.MISSING,
                    "a " + kind + " star needs its radius; none was given"));
        }
        for (ScaleAnchor extra : givenAnchors()) {
            if (extra.component() != Component.radius) {
                rules.add(new Violation(extra.component(), radius.isPresent() ? Problem.CONFLICT
                        : Problem.NOT_APPLICABLE, "a " + kind + " star is fixed by its mass and radius"
                        + (radius.isPresent() ? ", and the radius is already given" : "") + "; "
                        + describe(extra.component()) + " applies to kind isentropic only"));
            }
        }
    }

    /** Isentropic star: no index; exactly one anchor, the first written counts. */
    private void isentropic(StarRequestRules rules) {
        if (index.isPresent()) {
            rules.add(new Violation(Component.index, Problem.NOT_APPLICABLE, "polytropic index n = "
                    + index.getAsDouble() + " does not apply to an isentropic star, whose structure follows from"
                    + " the EOS; leave it out"));
        }
        List<ScaleAnchor> given = givenAnchors();
        if (given.isEmpty()) {
            rules.add(new Violation(Component.radius, Problem.MISSING, "an isentropic star needs exactly one of"
                    + " radius, central temperature and entropy per baryon besides its mass; none was given"));
        }
        for (int i = 1; i < given.size(); i++) {
            rules.add(new Violation(given.get(i).component(), Problem.CONFLICT, "an isentropic star takes exactly one"
                    + " of radius, central temperature and entropy per baryon, and "
                    + describe(given.get(0).component()) + " is already given"));
        }
    }

    /** @return the anchors given, in the order written */
    private List<ScaleAnchor> givenAnchors() {
        List<ScaleAnchor> given = new ArrayList<>();
        for (Component c : anchorOrder) {
            switch (c) {
                case radius -> radius.ifPresent(v -> given.add(new ScaleAnchor.Radius(v)));
                case centralTemperature -> centralTemperature.ifPresent(v ->
                        given.add(new ScaleAnchor.CentralTemperature(v)));
                case entropy -> entropyPerBaryon.ifPresent(v -> given.add(new ScaleAnchor.Entropy(v)));
                default -> throw new IllegalArgumentException(c + " is not an anchor of an isentropic star");
            }
        }
        return given;
    }

    private static String describe(Component c) {
        return switch (c) {
            case radius -> "the radius";
            case centralTemperature -> "the central temperature";
            case entropy -> "the entropy per baryon";
            default -> c.name();
        };
    }
}
