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
import org.openjdk.jmh.annotations.Param;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosState;
import org.stellabar.eos.fermi.FermiGasRadiationEos;

/** Speed of one full state of the Fermi–Dirac equation of state at pair-rich, degenerate and classical points. */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class FermiStateBenchmark {

    private static final Composition OXYGEN = Composition.fromAnyTwo(0.0, 0.0, 1.0, 16.0);

    /** ρ [g/cm3] and T [K] of the state timed. */
    @Param({"1e4:2e9", "1e8:1e8", "1e2:1e7"})
    public String point;

    private FermiGasRadiationEos eos;
    private double rho;
    private double temperature;

    @Setup
    public void setUp() {
        eos = new FermiGasRadiationEos(OXYGEN);
        String[] parts = point.split(":");
        rho = Double.parseDouble(parts[0]);
        temperature = Double.parseDouble(parts[1]);
    }

    @Benchmark
    public EosState fullState() {
        return eos.state(rho, temperature);
    }

}
