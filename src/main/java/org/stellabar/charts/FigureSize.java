package org.stellabar.charts;

/**
 * The printed size of a figure and the text size that goes with it. Charts are laid out in
 * points (1/72 inch) at this size, so text is the given size on paper whatever the format.
 *
 * @param widthInches printed width
 * @param heightInches printed height
 * @param fontPoints size of axis titles; tick labels and legend are one point smaller
 */
public record FigureSize(double widthInches, double heightInches, double fontPoints) {

    /**
     * One journal column, about 3.5 inches wide (ApJ, MNRAS and A&amp;A columns are 3.3 to 3.5
     * inches: common practice, no source), 4:3.
     */
    public static final FigureSize ONE_COLUMN = new FigureSize(3.5, 2.625, 8);

    /** The full text width, about 7.2 inches wide (common practice, no source), 1.6:1. */
    public static final FigureSize TWO_COLUMN = new FigureSize(7.2, 4.5, 9);

    /**
     * Canonical constructor: checks ranges and consistency.
     *
     * @param widthInches printed width
     * @param heightInches printed height
     * @param fontPoints size of axis titles; tick labels and legend are one point smaller
     */
    public FigureSize {
        if (!(widthInches >= 1 && widthInches <= 20 && heightInches >= 1 && heightInches <= 20)) {
            throw new IllegalArgumentException("figure size " + widthInches + " x " + heightInches
                    + " in: each side must lie between 1 and 20 inches");
        }
        if (!(fontPoints >= 5 && fontPoints <= 24)) {
            throw new IllegalArgumentException("figure font size " + fontPoints + " pt: allowed 5 to 24 pt");
        }
    }

    /** @return the width in points */
    public double widthPoints() {
        return widthInches * 72;
    }

    /** @return the height in points */
    public double heightPoints() {
        return heightInches * 72;
    }
}
