package org.ladderkin.gui.series;

import java.awt.BorderLayout;
import java.awt.Desktop;
import java.awt.FlowLayout;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleConsumer;
import java.util.function.Supplier;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTable;
import javax.swing.ListSelectionModel;
import javax.swing.SwingWorker;
import javax.swing.table.AbstractTableModel;
import org.ladderkin.units.Rounded;
import org.ladderkin.archive.ArchivedFit;
import org.ladderkin.archive.FitParameter;
import org.ladderkin.archive.Trend;
import org.ladderkin.archive.TrendAxis;
import org.ladderkin.archive.TrendQuantity;
import org.ladderkin.gui.chart.ChartView;
import org.ladderkin.report.ChartSpec;
import org.ladderkin.report.TrendReport;

/**
 * The "Sample series" view: the archive's current fits in a sortable table, the trend chart (axes chosen above it)
 * with the open plan's sample marked, and two actions: open the selected fit's report, and plan the next size (the
 * open plan's diameter set one step beyond the series). The archive is read off the event thread.
 */
public final class SampleSeriesWindow extends JFrame {

    private static final String[] COLUMNS = {"fit", "sample", "material", "d (nm)", "V (nm³)", "τ₂ (ps)", "± (ps)",
        "σ (cm²)", "status", "added", "warning"};

    private final Supplier<String> currentSample;
    private final DoubleConsumer planDiameterNm;
    private final String[] location = SeriesArchive.defaultLocation();
    private final FitTable table = new FitTable();
    private final JTable view = new JTable(table);
    private final JComboBox<TrendAxis> xAxis = new JComboBox<>(TrendAxis.values());
    private final JComboBox<TrendQuantity> yAxis = new JComboBox<>(TrendQuantity.values());
    private final JLabel status = new JLabel(" ");
    private final ChartView chart = new ChartView(new ChartSpec("Trend", "", "", true, true, List.of()));

    /**
     * @param currentSample   the open plan's sample name, marked on the chart (may give null)
     * @param planDiameterNm  sets the open plan's diameter (nm), for "Plan the next size"
     */
    public SampleSeriesWindow(Supplier<String> currentSample, DoubleConsumer planDiameterNm) {
        super("Sample series — " + SeriesArchive.defaultLocation()[1]);
        this.currentSample = currentSample;
        this.planDiameterNm = planDiameterNm;
        setName("series:window");
        view.setName("series:table");
        view.setAutoCreateRowSorter(true);
        view.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        xAxis.setName("series:x");
        yAxis.setName("series:y");
        xAxis.addActionListener(e -> redrawTrend());
        yAxis.addActionListener(e -> redrawTrend());

        JButton open = new JButton("Open this fit");
        open.setName("series:open-fit");
        open.addActionListener(e -> openSelectedFit());
        JButton next = new JButton("Plan the next size");
        next.setName("series:plan-next");
        next.addActionListener(e -> planNextSize());
        JButton reload = new JButton("Reload");
        reload.addActionListener(e -> load());

        JPanel top = new JPanel(new FlowLayout(FlowLayout.LEFT));
        top.add(new JLabel("x"));
        top.add(xAxis);
        top.add(new JLabel("y"));
        top.add(yAxis);
        top.add(reload);
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.LEFT));
        buttons.add(open);
        buttons.add(next);
        buttons.add(status);
        JPanel chartPanel = new JPanel(new BorderLayout());
        chartPanel.add(top, BorderLayout.NORTH);
        chartPanel.add(chart, BorderLayout.CENTER);
        JSplitPane split = new JSplitPane(JSplitPane.VERTICAL_SPLIT, new JScrollPane(view), chartPanel);
        split.setResizeWeight(0.4);
        getContentPane().add(split, BorderLayout.CENTER);
        getContentPane().add(buttons, BorderLayout.SOUTH);
        setSize(980, 720);
        setDefaultCloseOperation(DISPOSE_ON_CLOSE);
        load();
    }

    /** Reads the archive in the background and fills the table and chart. */
    public void load() {
        status.setText("reading " + location[1] + " …");
        new SwingWorker<List<ArchivedFit>, Void>() {
            @Override
            protected List<ArchivedFit> doInBackground() {
                return SeriesArchive.fits(location[0], location[1]);
            }

            @Override
            protected void done() {
                try {
                    table.set(get());
                    status.setText(table.rows.size() + " current fits");
                    redrawTrend();
                } catch (Exception e) {
                    Throwable c = e.getCause() == null ? e : e.getCause();
                    status.setText("archive not readable: " + c.getMessage());
                }
            }
        }.execute();
    }

    List<ArchivedFit> rows() {
        return List.copyOf(table.rows);
    }

    ChartSpec chartSpec() {
        return chart.spec();
    }

    private void redrawTrend() {
        if (table.rows.isEmpty()) {
            return;
        }
        try {
            Trend t = SeriesArchive.trend(table.rows, (TrendAxis) xAxis.getSelectedItem(), (TrendQuantity) yAxis.getSelectedItem());
            chart.show(TrendReport.chart(t, currentSample.get()));
            status.setText(summary(t));
        } catch (RuntimeException e) {
            status.setText(e.getMessage());
        }
    }

    private static String summary(Trend t) {
        List<String> parts = new ArrayList<>();
        for (Trend.MaterialTrend m : t.materials()) {
            parts.add(m.fit() == null ? m.material() + ": " + m.points().size() + " samples"
                    : String.format(Locale.ROOT, "%s: p = %s, scatter %.0f %%", m.material(),
                    Rounded.pm(m.fit().exponent(), m.fit().exponentStdError()), 100 * m.fit().scatterLn()));
        }
        return parts.isEmpty() ? "no fit gives " + t.y().parameterKey() : String.join("; ", parts);
    }

    private ArchivedFit selected() {
        int row = view.getSelectedRow();
        return row < 0 ? null : table.rows.get(view.convertRowIndexToModel(row));
    }

    private void openSelectedFit() {
        ArchivedFit f = selected();
        if (f == null) {
            status.setText("select a fit first");
            return;
        }
        Path report = Path.of(f.fit().sourceDir(), "fit-report.html");
        try {
            if (Files.isRegularFile(report) && Desktop.isDesktopSupported() && Desktop.getDesktop().isSupported(Desktop.Action.BROWSE)) {
                Desktop.getDesktop().browse(report.toUri());
                return;
            }
        } catch (java.io.IOException | UnsupportedOperationException e) {
            status.setText("cannot open " + report + ": " + e.getMessage());
        }
        JOptionPane.showMessageDialog(this, new JScrollPane(new javax.swing.JTextArea(f.fit().resultJson(), 24, 80)),
                "Fit F" + f.id() + " — " + f.sample().name(), JOptionPane.PLAIN_MESSAGE);
    }

    private void planNextSize() {
        ArchivedFit f = selected();
        String material = f != null ? f.sample().material() : table.rows.isEmpty() ? null : table.rows.get(0).sample().material();
        if (material == null) {
            status.setText("the archive has no samples yet");
            return;
        }
        double next = SeriesArchive.nextDiameterNm(table.rows.stream().map(ArchivedFit::sample).toList(), material);
        if (Double.isNaN(next)) {
            status.setText("no " + material + " sample gives its size");
            return;
        }
        planDiameterNm.accept(next);
        status.setText(String.format(Locale.ROOT, "the plan's diameter is now %.2f nm (next %s size)", next, material));
    }

    /** The table's rows: one current fit each. */
    private static final class FitTable extends AbstractTableModel {
        private final List<ArchivedFit> rows = new ArrayList<>();

        void set(List<ArchivedFit> fits) {
            rows.clear();
            rows.addAll(fits);
            fireTableDataChanged();
        }

        @Override
        public int getRowCount() {
            return rows.size();
        }

        @Override
        public int getColumnCount() {
            return COLUMNS.length;
        }

        @Override
        public String getColumnName(int c) {
            return COLUMNS[c];
        }

        @Override
        public Class<?> getColumnClass(int c) {
            return c == 0 || (c >= 3 && c <= 7) ? Double.class : String.class;
        }

        @Override
        public Object getValueAt(int r, int c) {
            ArchivedFit f = rows.get(r);
            return switch (c) {
                case 0 -> (double) f.id();
                case 1 -> f.sample().name();
                case 2 -> f.sample().material();
                case 3 -> f.sample().sizeM() * 1e9;
                case 4 -> f.sample().volumeM3() * 1e27;
                case 5 -> f.parameter("tauAuger2Ps").map(FitParameter::value).orElse(Double.NaN);
                case 6 -> f.parameter("tauAuger2Ps").map(FitParameter::bestStdError).orElse(Double.NaN);
                case 7 -> f.parameter("crossSectionCm2").map(FitParameter::value).orElse(Double.NaN);
                case 8 -> f.fit().status();
                case 9 -> f.addedAt();
                default -> f.fit().warning();
            };
        }
    }
}
