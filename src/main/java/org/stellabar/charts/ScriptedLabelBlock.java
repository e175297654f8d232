package org.stellabar.charts;

import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.Paint;
import java.awt.geom.Rectangle2D;
import org.jfree.chart.block.AbstractBlock;
import org.jfree.chart.block.Block;
import org.jfree.chart.block.RectangleConstraint;
import org.jfree.chart.ui.Size2D;
import org.jfree.chart.ui.TextAnchor;

/**
 * A JFreeChart block holding one {@link ScriptedText}, for legend entries and titles (JFreeChart's
 * own label block takes plain strings only, without sub- or superscripts).
 */
final class ScriptedLabelBlock extends AbstractBlock implements Block {

    private static final long serialVersionUID = 1L;

    private final transient ScriptedText text;
    private final Font font;
    private final transient Paint paint;

    ScriptedLabelBlock(ScriptedText text, Font font, Paint paint) {
        this.text = text;
        this.font = font;
        this.paint = paint;
    }

    @Override
    public Size2D arrange(Graphics2D g2, RectangleConstraint constraint) {
        Rectangle2D b = text.bounds(g2, font);
        return new Size2D(calculateTotalWidth(b.getWidth()), calculateTotalHeight(b.getHeight()));
    }

    @Override
    public void draw(Graphics2D g2, Rectangle2D area) {
        draw(g2, area, null);
    }

    @Override
    public Object draw(Graphics2D g2, Rectangle2D area, Object params) {
        Rectangle2D inner = trimPadding(trimBorder(trimMargin(area)));
        g2.setPaint(paint);
        text.draw(g2, font, inner.getX(), inner.getCenterY(), TextAnchor.HALF_ASCENT_LEFT);
        return null;
    }
}
