package org.ladderkin.report;

import java.awt.Graphics2D;
import java.awt.Shape;
import java.awt.geom.Rectangle2D;
import org.jfree.chart.LegendItem;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.entity.EntityCollection;
import org.jfree.chart.plot.CrosshairState;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYDataset;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.SVGHints;

/**
 * Lines and markers of a {@link ChartSpec}. In SVG every line and marker carries an id naming its chart and its
 * series' place in the spec ({@code <chart>-s<i>-line}, {@code <chart>-s<i>-p<k>}), so a reader of the file (or a
 * test) can tell which series drew it. A marker series whose fit line shares its colour and is left out of the legend
 * shows marker and line in its legend entry.
 */
final class SeriesRenderer extends XYLineAndShapeRenderer {

    private static final long serialVersionUID = 1L;

    private final String chartId;
    private final int[] specIndex;
    private final boolean[] legendLine;

    /**
     * @param chartId    prefix of the SVG ids
     * @param specIndex  the spec's index of each dataset series
     * @param legendLine per dataset series: draw a line in its legend entry as well
     */
    SeriesRenderer(String chartId, int[] specIndex, boolean[] legendLine) {
        super(true, false);
        this.chartId = chartId;
        this.specIndex = specIndex.clone();
        this.legendLine = legendLine.clone();
        setDrawSeriesLineAsPath(true);
        setDrawOutlines(false);
    }

    @Override
    protected void drawFirstPassShape(Graphics2D g2, int pass, int series, int item, Shape shape) {
        name(g2, chartId + "-s" + specIndex[series] + "-line");
        super.drawFirstPassShape(g2, pass, series, item, shape);
        unname(g2);
    }

    @Override
    protected void drawSecondaryPass(Graphics2D g2, XYPlot plot, XYDataset dataset, int pass, int series, int item,
                                     ValueAxis domainAxis, Rectangle2D dataArea, ValueAxis rangeAxis,
                                     CrosshairState crosshairState, EntityCollection entities) {
        name(g2, chartId + "-s" + specIndex[series] + "-p" + item);
        super.drawSecondaryPass(g2, plot, dataset, pass, series, item, domainAxis, dataArea, rangeAxis, crosshairState, entities);
        unname(g2);
    }

    @Override
    public LegendItem getLegendItem(int datasetIndex, int series) {
        LegendItem item = super.getLegendItem(datasetIndex, series);
        if (item != null && legendLine[series]) {
            item.setLineVisible(true);
            item.setLinePaint(lookupSeriesPaint(series));
            item.setLineStroke(lookupSeriesStroke(series));
        }
        return item;
    }

    private static void name(Graphics2D g2, String id) {
        if (g2 instanceof SVGGraphics2D svg && !svg.getElementIDs().contains(id)) {
            svg.setRenderingHint(SVGHints.KEY_ELEMENT_ID, id);
        }
    }

    /** An id not taken by the element it was meant for (nothing drawn) must not land on the next one. */
    private static void unname(Graphics2D g2) {
        if (g2 instanceof SVGGraphics2D svg) {
            svg.setRenderingHint(SVGHints.KEY_ELEMENT_ID, null);
        }
    }

    @Override
    public boolean equals(Object o) {
        return super.equals(o) && o instanceof SeriesRenderer r && chartId.equals(r.chartId)
                && java.util.Arrays.equals(specIndex, r.specIndex) && java.util.Arrays.equals(legendLine, r.legendLine);
    }

    @Override
    public int hashCode() {
        return super.hashCode() * 31 + chartId.hashCode();
    }
}
