package org.stellabar.bench;

import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import org.stellabar.eos.Composition;
import org.stellabar.structure.StarKind;
import org.stellabar.survey.AxisSpacing;
import org.stellabar.survey.AxisQuantity;
import org.stellabar.survey.PlaneSurvey;
import org.stellabar.survey.SurveyAxis;
import org.stellabar.survey.SurveyOutcome;
import org.stellabar.survey.SurveyPlan;

/**
 * A survey of 400 standard models (20 masses × 20 radii, 400 profile rows each) computed by
 * {@link PlaneSurvey} in a pool of 1 and of 2 threads: the survey's parallel speed-up on a
 * 2-core machine (goal ≥ 1.8). The parallel stream of the survey runs in the pool that calls it.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class SurveyBenchmark {

    @Param({"1", "2"})
    public int threads;

    private ForkJoinPool pool;
    private SurveyPlan plan;
    private PlaneSurvey survey;

    @Setup
    public void setUp() {
        pool = new ForkJoinPool(threads);
        plan = new SurveyPlan("bench", StarKind.standard, Map.of(), OptionalDouble.empty(),
                Composition.of(0.7, 0.28, 0.02), 400,
                List.of(new SurveyAxis(AxisQuantity.mass, SOLAR_MASS, 1e5 * SOLAR_MASS, 20, AxisSpacing.log),
                        new SurveyAxis(AxisQuantity.radius, 10 * SOLAR_RADIUS, 1e4 * SOLAR_RADIUS, 20,
                                AxisSpacing.log)), org.stellabar.eos.Electrons.classical);
        survey = new PlaneSurvey();
    }

    @TearDown
    public void tearDown() {
        pool.shutdown();
    }

    @Benchmark
    public List<SurveyOutcome> fourHundredStandardModels() throws Exception {
        return pool.submit(() -> survey.compute(plan, 0, plan.size())).get();
    }
}
