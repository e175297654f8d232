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
        SurveyRows rows = new SurveyRows(outcomes.size());
        outcomes.forEach(rows::set);
        return of(plan, rows, contentHash);
    }

    /**
     * @param plan the survey
     * @param rows every point's outcome
     * @param contentHash the survey file's SHA-256, recorded in the metadata
     * @return the table
     */
    public static Table of(SurveyPlan plan, SurveyRows rows, String contentHash) {
        if (rows.size() != plan.size() || !rows.complete()) {
            throw new IllegalArgumentException("the outcomes of " + rows.size() + " points"
                    + (rows.complete() ? "" : ", not all given,") + " for a survey of " + plan.size());
        }
        Table.Builder b = new Table.Builder(plan.name(), metadata(plan, rows.failures(), rows.size(), contentHash));
        for (int a = 0; a < plan.axes().size(); a++) {
            SurveyAxis axis = plan.axes().get(a);
            // the axis's values in display units, once; each row takes its own by index
            double[] shown = new double[axis.count()];
            for (int k = 0; k < shown.length; k++) {
                shown[k] = axis.quantity().toDisplay(axis.value(k));
            }
            double[] values = new double[rows.size()];
            for (int p = 0; p < values.length; p++) {
                values[p] = shown[plan.indices(p)[a]];
            }
            b.number(axis.quantity().column(), values);
        }
        b.text(STATUS, "ok: the model was built; failed: see reason (its numbers are then 0)", rows.statusColumn());
        b.text(REASON, "why the model of this point could not be built; empty when it was", rows.failureColumn());
        StarSchema.addColumns(b, rows.textColumns(), rows.numberColumns(), Set.of(StarSchema.NAME));
        return b.build();
    }

    private static Metadata metadata(SurveyPlan plan, long failed, int points, String contentHash) {
        Inputs.Builder inputs = Inputs.builder().text("survey", plan.name()).text("kind", plan.kind().word());
        for (Map.Entry<AxisQuantity, Double> e : plan.fixed().entrySet()) {
            Quantity q = e.getKey().column();
            inputs.number("fixed_" + e.getKey().word(), e.getKey().toDisplay(e.getValue()), q.unit(),
                    "fixed " + e.getKey().word());
        }
        plan.index().ifPresent(n -> inputs.number("index", n, "", "polytropic index n"));
        Composition c = plan.composition();
        inputs.text("composition", c.fromMu() ? String.format(Locale.US, "mu = %s", c.mu())
                : String.format(Locale.US, "X = %s, Y = %s, Z = %s", c.X(), c.Y(), c.Z()));
        for (int a = 0; a < plan.axes().size(); a++) {
            SurveyAxis axis = plan.axes().get(a);
            Quantity q = axis.quantity().column();
            inputs.text("axis_" + (a + 1), String.format(Locale.US, "%s from %s to %s %s, %d values, %s steps",
                    axis.quantity().word(), axis.quantity().toDisplay(axis.from()), axis.quantity().toDisplay(axis.to()),
                    q.unit().isEmpty() ? "" : q.unit(), axis.count(), axis.spacing()).replace("  ", " "));
        }
        inputs.integer("points", plan.points(), "profile rows per model");
        inputs.text("electrons", plan.electrons().name());
        inputs.text("survey_sha256", contentHash);
        List<String> notes = new java.util.ArrayList<>(StarBuilder.PHYSICS);
        notes.add("rows: one per point, first axis outer; " + failed + " of " + points
                + " points failed (status failed, reason given, numbers 0)");
        String title = String.format(Locale.US, "stellabar survey %s: %s stars over %s", plan.name(),
                plan.kind().word(), String.join(" x ", plan.axes().stream().map(x -> x.quantity().word()).toList()));
        return Metadata.of(title, inputs.build(), notes);
    }
}
