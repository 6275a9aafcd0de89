package org.ladderkin.gui.view;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import javax.swing.JTabbedPane;
import org.ladderkin.gui.chart.ChartView;
import org.ladderkin.report.ChartSpec;

/** The charts of the current prediction, one per tab; the selected one is what "Export chart" writes. */
final class ChartsPanel extends JTabbedPane {

    private final List<ChartView> views = new ArrayList<>();
    private final java.util.function.BiConsumer<ChartSpec, org.ladderkin.gui.chart.ChartExport.Format> export;

    /** @param export writes a chart in a format (offered on each chart's right-click menu) */
    ChartsPanel(java.util.function.BiConsumer<ChartSpec, org.ladderkin.gui.chart.ChartExport.Format> export) {
        this.export = export;
        setName("charts");
    }

    /** Shows {@code specs}, keeping the tabs (and the selected tab) when the set of charts is unchanged. */
    void show(List<ChartSpec> specs) {
        boolean sameTabs = specs.size() == views.size();
        for (int i = 0; sameTabs && i < specs.size(); i++) {
            sameTabs = specs.get(i).title().equals(views.get(i).spec().title());
        }
        if (sameTabs) {
            for (int i = 0; i < specs.size(); i++) {
                views.get(i).show(specs.get(i));
            }
            return;
        }
        int selected = getSelectedIndex();
        removeAll();
        views.clear();
        for (ChartSpec spec : specs) {
            ChartView v = new ChartView(spec);
            v.offerExport(export);
            views.add(v);
            addTab(shortTitle(spec.title()), null, v, spec.title());
        }
        if (selected >= 0 && selected < views.size()) {
            setSelectedIndex(selected);
        }
    }

    /** The chart in the selected tab. */
    Optional<ChartSpec> selected() {
        int i = getSelectedIndex();
        return i < 0 ? Optional.empty() : Optional.of(views.get(i).spec());
    }

    /** Every chart shown, in tab order. */
    List<ChartSpec> specs() {
        return views.stream().map(ChartView::spec).toList();
    }

    /**
     * A tab title short enough for six tabs in one row of the chart column; the tab's tooltip holds the full title.
     */
    static String shortTitle(String title) {
        for (String[] row : SHORT) {
            if (title.startsWith(row[0])) {
                return row[1];
            }
        }
        int paren = title.indexOf(" (");
        String s = paren > 0 ? title.substring(0, paren) : title;
        return s.replace("Photoluminescence", "PL").replace("Excitons per dot", "P(N)");
    }

    private static final String[][] SHORT = {
        {"Band-edge bleach", "Bleach"}, {"Photoluminescence", "PL"}, {"Early and late", "Early/late"},
        {"Early/late ratio", "A/B"}, {"Excitons per dot", "P(N)"}, {"Pulse-train build-up", "Build-up"}};
}
