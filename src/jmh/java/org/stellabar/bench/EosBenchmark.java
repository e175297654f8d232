package org.stellabar.bench;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosArrays;
import org.stellabar.eos.EosInversion;
import org.stellabar.eos.EosState;
import org.stellabar.eos.GasRadiationEos;

/**
 * Speed of one full state (with and without warnings), one (ρ, P) → T inversion, and 10⁶ grid
 * points through the array path.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class EosBenchmark {

    private GasRadiationEos eos;
    private EosInversion inversion;
    private double[] rho;
    private double[] temperature;
    private EosArrays out;

    @Setup
    public void setUp() {
        eos = new GasRadiationEos(Composition.of(0.7, 0.28, 0.02));
        inversion = new EosInversion(eos);
        int n = 1_000_000;
        rho = new double[n];
        temperature = new double[n];
        for (int i = 0; i < 1000; i++) {
            for (int j = 0; j < 1000; j++) {
                rho[i * 1000 + j] = Math.pow(10.0, -10.0 + 18.0 * i / 999.0);
                temperature[i * 1000 + j] = Math.pow(10.0, 3.0 + 7.0 * j / 999.0);
            }
        }
        out = new EosArrays(n);
    }

    @Benchmark
    public EosState fullState() {
        return eos.state(1.0, 1e7);
    }

    /** A white-dwarf-like state that carries three warnings, each with a formatted message. */
    @Benchmark
    public EosState fullStateWithWarnings() {
        return eos.state(1e6, 1e7);
    }

    @Benchmark
    public double temperatureFromDensityAndPressure() {
        return inversion.temperature(1.0, 1.372162e15);
    }

    @Benchmark
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    public EosArrays millionGridPoints() {
        eos.evaluate(rho, temperature, 0, rho.length, out);
        return out;
    }
}
