package org.stellabar.output;

import java.util.LinkedHashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * What an exported notebook shows: a title, a Markdown block describing the run, and the plots.
 *
 * @param title the notebook's heading
 * @param description Markdown: what was computed, from which inputs, by which version with which
 *     constants ({@link NotebookWriter#describe} makes one from table metadata)
 * @param plots the figures, at least one
 */
public record NotebookContent(String title, String description, List<NotebookPlot> plots) {

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency; copies collections in.
     *
     * @param title the notebook's heading
     * @param description Markdown: what was computed, from which inputs, by which version with which
     *        constants ({@link NotebookWriter#describe} makes one from table metadata)
     * @param plots the figures, at least one
     */
    public NotebookContent {
        if (title == null || title.isBlank()) {
            throw new IllegalArgumentException("notebook title is empty");
        }
        Objects.requireNonNull(description, "description");
        plots = List.copyOf(plots);
        if (plots.isEmpty()) {
            throw new IllegalArgumentException("notebook '" + title + "' has no plots");
        }
    }

    /** @return the CSV files the plots read, each once, in order of first use */
    public List<String> csvFiles() {
        Set<String> files = new LinkedHashSet<>();
        plots.forEach(p -> files.add(p.csvFile()));
        return List.copyOf(files);
    }
}
