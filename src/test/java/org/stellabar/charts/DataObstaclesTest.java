package org.stellabar.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import org.junit.jupiter.api.Test;

class DataObstaclesTest {

    private static final Rectangle2D BOX = new Rectangle2D.Double(0, 0, 10, 10);

    // Closed forms: the diagonal of a 10 x 10 box is 10√2 long inside it; half a segment that
    // starts at the centre and leaves to the right lies inside; a segment beside the box, none.
    @Test
    void clippedLengthMatchesClosedForms() {
        assertEquals(10 * Math.sqrt(2), DataObstacles.clippedLength(new Line2D.Double(-5, -5, 15, 15), BOX), 1e-12);
        assertEquals(5, DataObstacles.clippedLength(new Line2D.Double(5, 5, 15, 5), BOX), 1e-12);
        assertEquals(0, DataObstacles.clippedLength(new Line2D.Double(11, 0, 11, 10), BOX), 0);
    }

    // A box clear of the data (by more than the clearance) costs nothing; one across a line, the
    // line's length inside it (with the clearance); one sticking out of the area, the area outside.
    @Test
    void costCountsLinesMarkersAndOverhang() {
        DataObstacles o = new DataObstacles(new Rectangle2D.Double(0, 0, 100, 100), 1.0);
        o.addSegment(new Line2D.Double(0, 50, 100, 50));
        o.addBox(new Rectangle2D.Double(80, 80, 4, 4));
        assertTrue(o.cost(new Rectangle2D.Double(10, 10, 20, 10)) < DataObstacles.FREE);
        assertEquals(22, o.cost(new Rectangle2D.Double(10, 45, 20, 10)), 1e-9);
        assertTrue(o.cost(new Rectangle2D.Double(78, 78, 4, 4)) > 1);
        assertEquals(50, o.cost(new Rectangle2D.Double(95, 10, 10, 10)), 1e-9);
    }
}
