package org.stellabar.survey;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.IntStream;
import org.stellabar.structure.StarBuilder;
import org.stellabar.structure.StarKind;
import org.stellabar.structure.StarModel;
import org.stellabar.structure.StarRequestException;
import org.stellabar.structure.StarSchema;

/**
 * Builds the models of a survey, in parallel on all cores, in point order. A point whose request
 * breaks a rule or whose model cannot be built (no solution, an iteration out of bounds, a
 * non-finite result) becomes a failed {@link SurveyOutcome} with the reason; it never stops the
 * survey.
 *
 * <p>Every point is computed on its own from the plan, so a part of a sharded survey gives the
 * same values, bit for bit, as the same points of the whole survey.
 */
public final class PlaneSurvey {

    private final StarBuilder builder;

    /** A survey computer with its own star builder (Lane-Emden solutions cached across points). */
    public PlaneSurvey() {
        this(new StarBuilder());
    }

    /** @param builder the star builder, shared by every point (thread-safe) */
    public PlaneSurvey(StarBuilder builder) {
        this.builder = builder;
    }

    /**
     * @param plan the survey
     * @param from first point (0-based, included)
     * @param to last point (excluded)
     * @return one outcome per point, in point order
     */
    public List<SurveyOutcome> compute(SurveyPlan plan, int from, int to) {
        if (from < 0 || to > plan.size() || from > to) {
            throw new IndexOutOfBoundsException("points " + from + ".." + to + " of " + plan.size());
        }
        return IntStream.range(from, to).parallel().mapToObj(p -> point(plan, p)).toList();
    }

    /**
     * Computes points into column storage, in blocks (each block in parallel), so that a whole
     * survey never holds an object per point.
     *
     * @param plan the survey
     * @param from first point (0-based, included)
     * @param to last point (excluded)
     * @param rows where the outcomes go, at their point numbers
     */
    public void computeInto(SurveyPlan plan, int from, int to, SurveyRows rows) {
        int block = 4096;
        for (int start = from; start < to; start += block) {
            compute(plan, start, Math.min(to, start + block)).forEach(rows::set);
        }
    }

    /**
     * @param plan the survey
     * @param point 0-based point number
     * @return the point's outcome
     */
    public SurveyOutcome point(SurveyPlan plan, int point) {
        try {
            StarModel model = builder.build(plan.draft(point).toRequest());
            StarSchema.Row row = StarSchema.row(model);
            String nonFinite = nonFinite(row);
            return nonFinite.isEmpty() ? new SurveyOutcome(point, "", row) : failed(plan, point, nonFinite);
        } catch (StarRequestException e) {
            List<String> problems = new ArrayList<>();
            e.violations().forEach(v -> problems.add(v.component() + ": " + v.message()));
            return failed(plan, point, String.join("; ", problems));
        } catch (RuntimeException e) {
            // no solution, an iteration that ran out of steps, an impossible composition at this
            // point: the point fails with its reason and the survey goes on
            String message = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
            return failed(plan, point, message);
        }
    }

    private static SurveyOutcome failed(SurveyPlan plan, int point, String reason) {
        List<String> texts = new ArrayList<>();
        for (String name : StarSchema.textNames()) {
            texts.add(switch (name) {
                case StarSchema.NAME -> plan.name() + "-" + (point + 1);
                case StarSchema.KIND -> plan.kind().word();
                case StarSchema.INDEX -> plan.kind() == StarKind.polytrope && plan.index().isPresent()
                        ? Double.toString(plan.index().getAsDouble()) : StarSchema.NO_INDEX;
                case StarSchema.VERDICT -> SurveyOutcome.FAILED;
                default -> "";
            });
        }
        double[] zeros = new double[StarSchema.numberQuantities().size()];
        return new SurveyOutcome(point, oneLine(reason), new StarSchema.Row(texts, zeros));
    }

    private static String nonFinite(StarSchema.Row row) {
        double[] numbers = row.numbers();
        List<String> bad = new ArrayList<>();
        for (int k = 0; k < numbers.length; k++) {
            if (!Double.isFinite(numbers[k])) {
                bad.add(StarSchema.numberQuantities().get(k).name());
            }
        }
        return bad.isEmpty() ? "" : "the model gave non-finite " + String.join(", ", bad);
    }

    private static String oneLine(String text) {
        String flat = text.replaceAll("\\s+", " ").strip();
        return flat.isEmpty() ? "failed without a message" : flat;
    }

    /**
     * @param outcomes outcomes
     * @return how many failed
     */
    public static long failures(List<SurveyOutcome> outcomes) {
        return outcomes.stream().filter(o -> !o.ok()).count();
    }

}
