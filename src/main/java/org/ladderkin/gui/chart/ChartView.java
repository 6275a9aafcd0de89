package org.ladderkin.gui.chart;

import java.awt.BorderLayout;
import java.awt.Color;
import javax.swing.JPanel;
import javax.swing.UIManager;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.LegendTitle;
import org.ladderkin.report.ChartSpec;
import org.ladderkin.report.Charts;

/**
 * One live chart. It draws a {@link ChartSpec} (kept, so exports write what is on screen) with the report's chart
 * builder and then takes its colours from the current theme.
 */
public final class ChartView extends JPanel {

    private final ChartPanel panel;
    private ChartSpec spec;

    public ChartView(ChartSpec spec) {
        super(new BorderLayout());
        this.panel = new ChartPanel(null, false, false, false, true, true);
        panel.setMouseWheelEnabled(true);
        add(panel, BorderLayout.CENTER);
        show(spec);
    }

    /** Draws {@code next} in place of the current chart. */
    public void show(ChartSpec next) {
        this.spec = next;
        JFreeChart chart = Charts.build(next);
        applyTheme(chart);
        panel.setChart(chart);
        panel.setToolTipText(next.title());
    }

    /** What this view shows. */
    public ChartSpec spec() {
        return spec;
    }

    /**
     * Offers "Export as …" for this chart in every format on a right click; {@code export} gets what the chart shows
     * at that moment and the chosen format.
     */
    public void offerExport(java.util.function.BiConsumer<ChartSpec, ChartExport.Format> export) {
        javax.swing.JPopupMenu menu = new javax.swing.JPopupMenu();
        for (ChartExport.Format f : ChartExport.Format.values()) {
            javax.swing.JMenuItem item = new javax.swing.JMenuItem("Export as " + f.description() + "…");
            item.setName("export-chart:" + f.name());
            item.addActionListener(e -> export.accept(spec, f));
            menu.add(item);
        }
        panel.setPopupMenu(menu);
    }

    @Override
    public void updateUI() {
        super.updateUI();
        if (spec != null) {
            show(spec);
        }
    }

    private static void applyTheme(JFreeChart chart) {
        Color bg = UIManager.getColor("Ladderkin.chart.background");
        Color plotBg = UIManager.getColor("Ladderkin.chart.plotBackground");
        Color grid = UIManager.getColor("Ladderkin.chart.gridline");
        Color fg = UIManager.getColor("Ladderkin.chart.foreground");
        if (bg == null || plotBg == null || grid == null || fg == null) {
            return;
        }
        chart.setBackgroundPaint(bg);
        chart.getTitle().setPaint(fg);
        XYPlot plot = chart.getXYPlot();
        plot.setBackgroundPaint(plotBg);
        plot.setDomainGridlinePaint(grid);
        plot.setRangeGridlinePaint(grid);
        for (var axis : new org.jfree.chart.axis.ValueAxis[] {plot.getDomainAxis(), plot.getRangeAxis()}) {
            axis.setLabelPaint(fg);
            axis.setTickLabelPaint(fg);
            axis.setAxisLinePaint(grid);
            axis.setTickMarkPaint(grid);
        }
        LegendTitle legend = chart.getLegend();
        if (legend != null) {
            legend.setBackgroundPaint(bg);
            legend.setItemPaint(fg);
        }
    }
}
