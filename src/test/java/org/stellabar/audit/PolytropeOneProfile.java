package org.stellabar.audit;

import static org.stellabar.physics.Constants.GRAVITATION;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.IntPredicate;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosInversion;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.output.CsvTableReader;

/**
 * A synthetic profile from the closed-form n = 1 polytrope, θ = sin ξ/ξ (Chandrasekhar 1939, ch.
 * IV; Horedt 2004, §2.3): r = αξ, ρ = ρ_c θ, P = Kρ², m = 4πα³ρ_c(sin ξ − ξ cos ξ), with
 * α² = K/(2πG), the surface at ξ₁ = π and ρ_c = π M/(4R³). The temperature is the one our
 * equation of state needs for (ρ, P), so a faithful audit finds the pressures equal. The grid is
 * smoothly non-uniform, ξ = ξ_max(u + 0.2u(1 − u)) for u evenly spaced in [0, 1], and stops short
 * of the surface (ρ = 0 there has no temperature).
 */
final class PolytropeOneProfile {

    final double mass;
    final double radius;
    final Composition composition;
    final int points;
    final double xiMax;
    final double[] r;
    final double[] m;
    final double[] rho;
    final double[] P;
    final double[] T;

    /**
     * @param mass total mass of the complete polytrope [g]
     * @param radius its radius [cm]
     * @param composition the mixture
     * @param points number of shells
     * @param xiMax last ξ, below π
     */
    PolytropeOneProfile(double mass, double radius, Composition composition, int points, double xiMax) {
        this.mass = mass;
        this.radius = radius;
        this.composition = composition;
        this.points = points;
        this.xiMax = xiMax;
        double alpha = radius / Math.PI;
        double rhoC = Math.PI * mass / (4.0 * radius * radius * radius);
        double k = 2.0 * Math.PI * GRAVITATION * alpha * alpha;
        EosInversion inversion = new EosInversion(new GasRadiationEos(composition));
        r = new double[points];
        m = new double[points];
        rho = new double[points];
        P = new double[points];
        T = new double[points];
        for (int i = 0; i < points; i++) {
            double u = (double) i / (points - 1);
            double xi = xiMax * (u + 0.2 * u * (1.0 - u));
            double theta = xi == 0.0 ? 1.0 : Math.sin(xi) / xi;
            r[i] = alpha * xi;
            rho[i] = rhoC * theta;
            P[i] = k * rho[i] * rho[i];
            m[i] = 4.0 * Math.PI * alpha * alpha * alpha * rhoC * (Math.sin(xi) - xi * Math.cos(xi));
            T[i] = inversion.temperature(rho[i], P[i]);
        }
    }

    /** A 10 Msun, 5 Rsun star of X = 0.7, Z = 0.02 (invented test values), stopping at ξ = 0.99π. */
    static PolytropeOneProfile standard(int points) {
        return new PolytropeOneProfile(10 * org.stellabar.physics.Constants.SOLAR_MASS,
                5 * org.stellabar.physics.Constants.SOLAR_RADIUS, Composition.of(0.7, 0.28, 0.02), points,
                0.99 * Math.PI);
    }

    /** @return CGS CSV lines, centre first, header "r [cm],m [g],rho [g/cm3],T [K],P [dyn/cm2]" */
    List<String> csv() {
        return csv(i -> false, 1.0);
    }

    /**
     * @param wrong rows (0-based, centre first) whose pressure is multiplied by {@code factor}
     * @param factor the factor
     * @return CGS CSV lines, centre first
     */
    List<String> csv(IntPredicate wrong, double factor) {
        List<String> lines = new ArrayList<>();
        lines.add("# synthetic n = 1 polytrope");
        lines.add("r [cm],m [g],rho [g/cm3],T [K],P [dyn/cm2]");
        for (int i = 0; i < points; i++) {
            double p = wrong.test(i) ? P[i] * factor : P[i];
            lines.add(r[i] + "," + m[i] + "," + rho[i] + "," + T[i] + "," + p);
        }
        return lines;
    }

    /** @return SI CSV lines, surface first, under foreign column names without units in the header */
    List<String> csvSurfaceFirstSi() {
        List<String> lines = new ArrayList<>();
        lines.add("radius_m,mass_kg,dens,temp,pres");
        for (int i = points - 1; i >= 0; i--) {
            lines.add(String.format(Locale.ROOT, "%s,%s,%s,%s,%s", r[i] / 100.0, m[i] / 1000.0, rho[i] * 1000.0, T[i],
                    P[i] / 10.0));
        }
        return lines;
    }

    static LoadedProfile load(List<String> lines, ColumnMapping mapping, Composition composition, boolean skip) {
        return new ProfileLoader(mapping, CompositionPolicy.wholeStar(composition), skip)
                .load(new CsvProfileSource(new CsvTableReader().parse("test.csv", lines)));
    }

    LoadedProfile load() {
        return load(csv(), ColumnMapping.ourNames(), composition, false);
    }
}
