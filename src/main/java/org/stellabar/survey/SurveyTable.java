package org.stellabar.survey;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.stellabar.eos.Composition;
import org.stellabar.structure.StarBuilder;
import org.stellabar.structure.StarSchema;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Quantity;
import org.stellabar.table.Table;

/**
 * The survey table, one row per point in point order (first axis outer): the swept inputs, the
 * status and reason, then every field of the star schema ({@link StarSchema}) but the star's
 * name. Built from the plan and the outcomes alone, so a merged set of parts gives the same table
 * as the unsharded run.
 */
public final class SurveyTable {

    /** Column: ok or failed. */
    public static final String STATUS = "status";
    /** Column: why a point failed; empty for a built model. */
    public static final String REASON = "reason";

    private SurveyTable() {
    }

    /**
     * @param plan the survey
     * @param outcomes every point's outcome, in point order
     * @param contentHash the survey file's SHA-256, recorded in the metadata
     * @return the table
     */
    public static Table of(SurveyPlan plan, List<SurveyOutcome> outcomes, String contentHash) {
        if (outcomes.size() != plan.size()) {
            throw new IllegalArgumentException(outcomes.size() + " outcomes for " + plan.size() + " points");
        }
        Table.Builder b = new Table.Builder(plan.name(), metadata(plan, outcomes, contentHash));
        for (int a = 0; a < plan.axes().size(); a++) {
            SurveyAxis axis = plan.axes().get(a);
            double[] values = new double[outcomes.size()];
            for (int i = 0; i < values.length; i++) {
                values[i] = axis.quantity().toDisplay(plan.values(outcomes.get(i).point())[a]);
            }
            b.number(axis.quantity().column(), values);
        }
        b.text(STATUS, "ok: the model was built; failed: see reason (its numbers are then 0)",
                outcomes.stream().map(SurveyOutcome::status).toList());
        b.text(REASON, "why the model of this point could not be built; empty when it was",
                outcomes.stream().map(SurveyOutcome::failure).toList());
        StarSchema.addColumns(b, outcomes.stream().map(SurveyOutcome::row).toList(), Set.of(StarSchema.NAME));
        return b.build();
    }

    /**
     * The table of a part, which has no rows of its own (its rows are in the part file).
     *
     * @param name the survey's name
     * @param contentHash the survey's content hash
     * @return a table without columns
     */
    public static Table of(String name, String contentHash) {
        return new Table.Builder(name, Metadata.of("part of survey " + name,
                Inputs.builder().text("survey_sha256", contentHash).build(), List.of())).build();
    }

    private static Metadata metadata(SurveyPlan plan, List<SurveyOutcome> outcomes, String contentHash) {
        Inputs.Builder inputs = Inputs.builder().text("survey", plan.name()).text("kind", plan.kind().word());
        for (Map.Entry<AxisQuantity, Double> e : plan.fixed().entrySet()) {
            Quantity q = e.getKey().column();
            inputs.number("fixed_" + e.getKey().word(), e.getKey().toDisplay(e.getValue()), q.unit(),
                    "fixed " + e.getKey().word());
        }
        plan.index().ifPresent(n -> inputs.number("index", n, "", "polytropic index n"));
        Composition c = plan.composition();
        inputs.text("composition", c.fromMu() ? String.format(Locale.ROOT, "mu = %s", c.mu())
                : String.format(Locale.ROOT, "X = %s, Y = %s, Z = %s", c.X(), c.Y(), c.Z()));
        for (int a = 0; a < plan.axes().size(); a++) {
            SurveyAxis axis = plan.axes().get(a);
            Quantity q = axis.quantity().column();
            inputs.text("axis_" + (a + 1), String.format(Locale.ROOT, "%s from %s to %s %s, %d values, %s steps",
                    axis.quantity().word(), axis.quantity().toDisplay(axis.from()), axis.quantity().toDisplay(axis.to()),
                    q.unit().isEmpty() ? "" : q.unit(), axis.count(), axis.spacing()).replace("  ", " "));
        }
        inputs.integer("points", plan.points(), "profile rows per model");
        inputs.text("survey_sha256", contentHash);
        long failed = PlaneSurvey.failures(outcomes);
        List<String> notes = new java.util.ArrayList<>(StarBuilder.PHYSICS);
        notes.add("rows: one per point, first axis outer; " + failed + " of " + outcomes.size()
                + " points failed (status failed, reason given, numbers 0)");
        String title = String.format(Locale.ROOT, "stellabar survey %s: %s stars over %s", plan.name(),
                plan.kind().word(), String.join(" x ", plan.axes().stream().map(x -> x.quantity().word()).toList()));
        return Metadata.of(title, inputs.build(), notes);
    }
}
