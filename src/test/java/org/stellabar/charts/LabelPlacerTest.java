package org.stellabar.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.geom.Rectangle2D;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class LabelPlacerTest {

    private static final Rectangle2D AREA = new Rectangle2D.Double(0, 0, 220, 150);

    // A lone marker keeps its label on the first ring, to its right.
    @Test
    void aLoneLabelSitsRightOfItsMarker() {
        List<LabelPlacer.Placement> p = LabelPlacer.place(new double[] {50}, new double[] {50}, new double[] {40},
                new double[] {8}, 3, 2, AREA);
        assertFalse(p.get(0).detached());
        assertEquals(55, p.get(0).box().getMinX(), 1e-12);
        assertEquals(46, p.get(0).box().getMinY(), 1e-12);
    }

    // Twenty-five labels of catalogue-name size (30-55 pt wide, 8 pt high) on a one-column plot
    // area (220 x 150 pt), markers scattered at random: no label overlaps another, covers a
    // marker or leaves the area.
    @Test
    void crowdedLabelsStayApart() {
        int n = 25;
        double[][] labels = scattered(12, n);
        double[] x = labels[0];
        double[] y = labels[1];
        double[] w = labels[2];
        double[] h = labels[3];
        List<LabelPlacer.Placement> p = LabelPlacer.place(x, y, w, h, 3, 1.8, AREA);
        for (int i = 0; i < n; i++) {
            assertFalse(p.get(i).overlapping(), "label " + i + " found a free place");
            Rectangle2D a = p.get(i).box();
            assertTrue(AREA.contains(a), "label " + i + " inside");
            for (int j = 0; j < n; j++) {
                Rectangle2D marker = new Rectangle2D.Double(x[j] - 3, y[j] - 3, 6, 6);
                Rectangle2D cut = a.createIntersection(marker);
                assertFalse(cut.getWidth() > 0 && cut.getHeight() > 0, "label " + i + " covers marker " + j);
                if (j > i) {
                    Rectangle2D other = a.createIntersection(p.get(j).box());
                    assertFalse(other.getWidth() > 0 && other.getHeight() > 0, "labels " + i + " and " + j);
                }
            }
        }
    }

    // Where there is no room, the placer says so rather than pretending (the check can fail).
    @Test
    void noRoomIsReported() {
        Rectangle2D tiny = new Rectangle2D.Double(0, 0, 30, 12);
        List<LabelPlacer.Placement> p = LabelPlacer.place(new double[] {10, 20}, new double[] {6, 6},
                new double[] {25, 25}, new double[] {8, 8}, 3, 1.8, tiny);
        assertTrue(p.get(0).overlapping() || p.get(1).overlapping());
    }

    // A search looked up in the memo (the second, with equal inputs) gives the same boxes and
    // leaves the same things on the plot as the search itself: the identity the memo relies on.
    @Test
    void aRepeatedSearchGivesTheSameLabelsAndObstacles() {
        int n = 12;
        double[][] labels = scattered(31, n);
        double[] x = labels[0];
        double[] y = labels[1];
        double[] w = labels[2];
        double[] h = labels[3];
        DataObstacles first = new DataObstacles(AREA, 1.0);
        DataObstacles second = new DataObstacles(AREA, 1.0);
        for (DataObstacles o : List.of(first, second)) {
            o.addSegment(new java.awt.geom.Line2D.Double(0, 140, 220, 10));
        }
        List<LabelPlacer.Placement> searched = LabelPlacer.place(x, y, w, h, 3, 1.8, first);
        List<LabelPlacer.Placement> looked = LabelPlacer.place(x.clone(), y.clone(), w.clone(), h.clone(), 3, 1.8,
                second);
        assertEquals(searched, looked);
        assertTrue(java.util.Arrays.equals(first.fingerprint(), second.fingerprint()));
        // markers, labels and leaders were added: 1 segment + n markers + n labels at least
        assertTrue(first.boxes().size() >= 2 * n, "boxes " + first.boxes().size());
    }

    /**
     * Markers scattered at random over {@link #AREA} with labels of catalogue-name size (30-55 pt
     * wide, 8 pt high).
     *
     * @return x, y, widths and heights, n each
     */
    private static double[][] scattered(long seed, int n) {
        SplittableRandom random = new SplittableRandom(seed);
        double[][] labels = new double[4][n];
        for (int i = 0; i < n; i++) {
            labels[0][i] = 20 + 180 * random.nextDouble();
            labels[1][i] = 15 + 120 * random.nextDouble();
            labels[2][i] = 30 + 25 * random.nextDouble();
            labels[3][i] = 8;
        }
        return labels;
    }
}
