package org.stellabar.charts;

import java.awt.Font;
import java.awt.Paint;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemSource;
import org.jfree.chart.block.Block;
import org.jfree.chart.block.BlockContainer;
import org.jfree.chart.block.BorderArrangement;
import org.jfree.chart.block.CenterArrangement;
import org.jfree.chart.title.LegendGraphic;
import org.jfree.chart.title.LegendItemBlockContainer;
import org.jfree.chart.title.LegendTitle;

/**
 * A legend whose entries are {@link ScriptedText} markup (the series label), so that labels such
 * as "∇_{ad}" get real subscripts. Everything else is JFreeChart's legend.
 */
final class ScriptedLegendTitle extends LegendTitle {

    private static final long serialVersionUID = 1L;

    ScriptedLegendTitle(LegendItemSource source) {
        super(source);
    }

    @Override
    protected Block createLegendItemBlock(LegendItem item) {
        LegendGraphic lg = new LegendGraphic(item.getShape(), item.getFillPaint());
        lg.setShapeFilled(item.isShapeFilled());
        lg.setLine(item.getLine());
        lg.setLineStroke(item.getLineStroke());
        lg.setLinePaint(item.getLinePaint());
        lg.setLineVisible(item.isLineVisible());
        lg.setShapeVisible(item.isShapeVisible());
        lg.setShapeOutlineVisible(item.isShapeOutlineVisible());
        lg.setOutlinePaint(item.getOutlinePaint());
        lg.setOutlineStroke(item.getOutlineStroke());
        lg.setPadding(getLegendItemGraphicPadding());
        lg.setShapeAnchor(getLegendItemGraphicAnchor());
        lg.setShapeLocation(getLegendItemGraphicLocation());

        LegendItemBlockContainer entry = new LegendItemBlockContainer(new BorderArrangement(), item.getDataset(),
                item.getSeriesKey());
        entry.add(lg, getLegendItemGraphicEdge());
        Font font = item.getLabelFont() != null ? item.getLabelFont() : getItemFont();
        Paint paint = item.getLabelPaint() != null ? item.getLabelPaint() : getItemPaint();
        ScriptedLabelBlock label = new ScriptedLabelBlock(ScriptedText.parse(item.getLabel()), font, paint);
        label.setPadding(getItemLabelPadding());
        entry.add(label);

        BlockContainer result = new BlockContainer(new CenterArrangement());
        result.add(entry);
        return result;
    }
}
