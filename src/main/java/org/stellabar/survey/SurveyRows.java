package org.stellabar.survey;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.stellabar.structure.StarSchema;

/**
 * The outcomes of a whole survey held column by column (a double[] per number field, the few
 * distinct words of each text field shared): what a table of 10⁶ points needs in memory, about
 * 250 MB, instead of an object per point. Filled point by point, in any order; threads may fill
 * different points at once (the parts of a merge are read in parallel).
 */
public final class SurveyRows {

    private final int size;
    private final String[] failures;
    private final List<String[]> texts = new ArrayList<>();
    private final List<double[]> numbers = new ArrayList<>();
    private final boolean[] filled;
    private final Map<String, String> words = new java.util.concurrent.ConcurrentHashMap<>();
    private final java.util.concurrent.atomic.AtomicInteger count = new java.util.concurrent.atomic.AtomicInteger();
    private final java.util.concurrent.atomic.AtomicLong failed = new java.util.concurrent.atomic.AtomicLong();

    /** @param size the number of points */
    public SurveyRows(int size) {
        this.size = size;
        this.failures = new String[size];
        this.filled = new boolean[size];
        for (int k = 0; k < StarSchema.textNames().size(); k++) {
            texts.add(new String[size]);
        }
        for (int k = 0; k < StarSchema.numberQuantities().size(); k++) {
            numbers.add(new double[size]);
        }
    }

    /** @return the number of points */
    public int size() {
        return size;
    }

    /**
     * @param outcome one point's outcome
     * @throws IllegalArgumentException if the point is outside the survey or already filled
     */
    public void set(SurveyOutcome outcome) {
        set(outcome.point(), outcome.failure(), outcome.row().texts(), outcome.row().numbers());
    }

    /**
     * @param point 0-based point number
     * @param failure empty, or why the model failed
     * @param textValues the star schema's text fields
     * @param numberValues the star schema's number fields
     * @throws IllegalArgumentException if the point is outside the survey or already filled, or the
     *     values do not fit the schema
     */
    public void set(int point, String failure, List<String> textValues, double[] numberValues) {
        if (point < 0 || point >= size || filled[point]) { // each point is filled by one thread only
            throw new IllegalArgumentException("point " + (point + 1) + (point < 0 || point >= size
                    ? " is outside the survey's " + size : " is given twice"));
        }
        if (textValues.size() != texts.size() || numberValues.length != numbers.size()) {
            throw new IllegalArgumentException("point " + (point + 1) + " does not have the star schema's "
                    + texts.size() + " texts and " + numbers.size() + " numbers");
        }
        filled[point] = true;
        count.incrementAndGet();
        failures[point] = shared(failure);
        if (!failure.isEmpty()) {
            failed.incrementAndGet();
        }
        for (int k = 0; k < texts.size(); k++) {
            texts.get(k)[point] = shared(textValues.get(k));
        }
        for (int k = 0; k < numbers.size(); k++) {
            numbers.get(k)[point] = numberValues[k];
        }
    }

    /** @return true when every point is filled */
    public boolean complete() {
        return count.get() == size;
    }

    /** @return how many points failed */
    public long failures() {
        return failed.get();
    }

    /** @return why each point failed ("" for a built model), in point order */
    List<String> failureColumn() {
        return List.of(failures);
    }

    /** @return the status words, in point order */
    List<String> statusColumn() {
        List<String> status = new ArrayList<>(size);
        for (String f : failures) {
            status.add(f.isEmpty() ? SurveyOutcome.OK : SurveyOutcome.FAILED);
        }
        return status;
    }

    /** @return the text fields' columns, in schema order */
    List<List<String>> textColumns() {
        return texts.stream().map(List::of).toList();
    }

    /** @return the number fields' columns, in schema order (not copied) */
    List<double[]> numberColumns() {
        return numbers;
    }

    private String shared(String word) {
        // long reasons are rare and differ; short repeated words (kind, index, verdict) are shared
        return word.length() > 40 ? word : words.computeIfAbsent(word, w -> w);
    }
}
