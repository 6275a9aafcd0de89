// Over 400 lines: the excitation table's model, renderer and live-checking editor read this view's models and stay private to it.
package org.ladderkin.gui.view;

import java.awt.Color;
import java.awt.Component;
import java.io.File;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Consumer;
import java.util.function.Supplier;
import java.awt.event.ActionEvent;
import javax.swing.AbstractAction;
import javax.swing.AbstractCellEditor;
import javax.swing.Action;
import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JFileChooser;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTable;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import javax.swing.Timer;
import javax.swing.UIManager;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import javax.swing.filechooser.FileNameExtensionFilter;
import javax.swing.table.AbstractTableModel;
import javax.swing.table.DefaultTableCellRenderer;
import javax.swing.table.TableCellEditor;
import net.miginfocom.swing.MigLayout;
import org.ladderkin.gui.chart.ChartView;
import org.ladderkin.gui.model.FitCharts;
import org.ladderkin.gui.model.FitData;
import org.ladderkin.gui.model.FitOptions;
import org.ladderkin.gui.model.FitRun;
import org.ladderkin.gui.model.FitSession;
import org.ladderkin.gui.model.PlanEditor;
import org.ladderkin.gui.model.PushBack;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;

/**
 * The "Measured data &amp; fit" view: load traces (file chooser or drag and drop), type each trace's excitation, choose
 * the freed parameters (checked against the data before a fit), run or cancel the fit with its elapsed time,
 * evaluations and best χ² so far, see the traces over the plan's model or the fit,
 * the residuals, the parameter table and diagnostics, and push the fitted values into the plan. State lives in the
 * {@link FitSession}'s models; this panel lays out, forwards and redraws, always on the event thread (the session
 * delivers fit results and progress there).
 */
public final class FitPanel extends JPanel {

    private final FitSession session;
    private final FitData data;
    private final FitRun run;
    private final PlanEditor editor;
    private final Supplier<Optional<Path>> lastDirectory;
    private final Consumer<Path> directoryUsed;

    private final JButton load = new JButton("Load traces…");
    /** Run Fit, enabled only when loaded traces and a valid plan let a fit start and none runs. */
    private final Action runAction = new AbstractAction("Run Fit") {
        @Override
        public void actionPerformed(ActionEvent e) {
            runFit();
        }
    };
    /** Cancel Fit, enabled only while a fit runs. */
    private final Action cancelAction = new AbstractAction("Cancel Fit") {
        @Override
        public void actionPerformed(ActionEvent e) {
            run.cancel();
        }
    };
    private final JButton fit = new JButton(runAction);
    private final JButton cancel = new JButton(cancelAction);
    /** Elapsed time, model evaluations and the best reduced χ² so far; a fit's length is not known in advance. */
    private final JLabel progress = new JLabel(" ");
    /** Ticks the elapsed time while a fit runs. */
    private final Timer clock = new Timer(1000, e -> showProgress());
    /**
     * The check before a fit, wrapped (a warning cut at the edge would hide its advice). Two lines are always kept
     * for it, so the form below does not jump while the user is about to click it.
     */
    private final JTextArea check = new JTextArea(2, 20);
    private final JButton push = new JButton("Use fitted values in the plan");
    private final JLabel status = new JLabel(" ");
    private final ExcitationModel excitationModel = new ExcitationModel();
    private final JTable excitations = new JTable(excitationModel);
    private final Map<String, JCheckBox> freeBoxes = new LinkedHashMap<>();
    private final JCheckBox pulseTrain = new JCheckBox("Pulse-train steady state at the plan's rate");
    private final JCheckBox response = new JCheckBox("Plan's instrument response");
    private final java.util.Map<String, JSplitPane> splits = new java.util.LinkedHashMap<>();
    private final ChartView overlay;
    private final ChartView residuals;
    /** Parameter, value, standard error, free or held. */
    private final RowTableModel<FitCharts.ParameterRow> parameterModel = new RowTableModel<>(
            List.of("Parameter", "Value", "Standard error", ""), (row, c) -> switch (c) {
                case 0 -> row.name();
                case 1 -> row.value();
                case 2 -> row.error();
                default -> row.free() ? "free" : "held";
            });
    private final JTable parameters = new JTable(parameterModel);
    private final JTextArea diagnostics = new JTextArea(6, 30);
    private String pushNote = "";

    /** The panel's split panes by name, so the window can remember where the user put their dividers. */
    java.util.Map<String, JSplitPane> splits() {
        return java.util.Collections.unmodifiableMap(splits);
    }

    /** Offers the right-click export on the overlay and residual charts. */
    void offerChartExport(java.util.function.BiConsumer<org.ladderkin.report.ChartSpec, org.ladderkin.gui.chart.ChartExport.Format> export) {
        overlay.offerExport(export);
        residuals.offerExport(export);
    }

    /**
     * @param session       the fit state
     * @param editor        the plan the fitted values go into
     * @param lastDirectory where the file chooser opens
     * @param directoryUsed told the folder of loaded files
     */
    public FitPanel(FitSession session, PlanEditor editor, Supplier<Optional<Path>> lastDirectory, Consumer<Path> directoryUsed) {
        super(new MigLayout("insets 6, fill", "[grow]", "[][][][grow]"));
        this.session = session;
        this.data = session.data();
        this.run = session.fit();
        this.editor = editor;
        this.lastDirectory = lastDirectory;
        this.directoryUsed = directoryUsed;
        setName("fit");
        overlay = new ChartView(session.overlayChart());
        overlay.setName("fit:overlay");
        residuals = new ChartView(session.residualChart());
        residuals.setName("fit:residuals");

        load.setName("fit:load");
        fit.setName("fit:run");
        cancel.setName("fit:cancel");
        progress.setName("fit:progress");
        check.setName("fit:check");
        check.setEditable(false);
        check.setFocusable(false);
        check.setOpaque(false);
        check.setLineWrap(true);
        check.setWrapStyleWord(true);
        check.setBorder(null);
        check.setFont(UIManager.getFont("Label.font"));
        push.setName("fit:push");
        status.setName("fit:status");
        load.addActionListener(e -> loadTracesWithChooser());
        push.addActionListener(e -> pushBack());
        fit.setToolTipText("Fit the loaded traces (Ctrl+R)");

        // the progress line gets a row of its own: beside the buttons it was cut at the default width
        JPanel toolbar = new JPanel(new MigLayout("insets 0", "[][]16[][grow]16[]"));
        toolbar.add(load);
        toolbar.add(fit);
        toolbar.add(cancel);
        toolbar.add(new JLabel(), "growx");
        toolbar.add(push, "wrap");
        toolbar.add(progress, "span, wmin 0, growx");

        excitations.setName("fit:excitations");
        excitations.setFillsViewportHeight(true);
        excitations.getColumnModel().getColumn(1).setCellRenderer(new ExcitationRenderer());
        excitations.getColumnModel().getColumn(1).setCellEditor(new ExcitationEditor());
        excitations.putClientProperty("terminateEditOnFocusLost", Boolean.TRUE);

        JPanel freePanel = new JPanel(new MigLayout("insets 0, wrap 2", "[][]"));
        List<FitOptions.FreeParameter> offered = new ArrayList<>(FitRun.offered());
        offered.add(FitRun.multiplicationYield());
        for (FitOptions.FreeParameter p : offered) {
            JCheckBox box = new JCheckBox(p.label());
            box.setName("fit:free:" + p.key());
            box.addActionListener(e -> session.setFree(p.key(), box.isSelected()));
            freeBoxes.put(p.key(), box);
            freePanel.add(box);
        }
        pulseTrain.setName("fit:pulse-train");
        pulseTrain.setToolTipText("Off: one pulse on fresh dots. On: the periodic steady state at the plan's chosen repetition rate.");
        pulseTrain.addActionListener(e -> session.setPulseTrain(pulseTrain.isSelected()));
        response.setName("fit:instrument-response");
        response.setToolTipText("Convolve the model with the plan's instrument response (Instruments ▸ IRF FWHM or IRF "
                + "file); its width is held and its centre is time zero. Free time zero when the data start near zero.");
        response.addActionListener(e -> session.setInstrumentResponse(response.isSelected()));

        parameters.setName("fit:parameters");
        parameters.setFillsViewportHeight(true);
        int[] widths = {170, 110, 110, 40};
        for (int c = 0; c < widths.length; c++) {
            parameters.getColumnModel().getColumn(c).setPreferredWidth(widths[c]);
        }
        diagnostics.setName("fit:diagnostics");
        diagnostics.setEditable(false);
        diagnostics.setLineWrap(true);
        diagnostics.setWrapStyleWord(true);

        JPanel left = new JPanel(new MigLayout("insets 0, fill, wrap 1", "[grow, fill]",
                // rows: excitations, free parameters, pulse mode, instrument response, parameter table, diagnostics
                "[]2[120:160, grow 30]8[]2[]4[]0[]8[]2[110:140, grow 30]8[]2[80:120, grow 40]"));
        left.add(new JLabel("Excitation per trace: pulse energy, photon fluence or ⟨N⟩"));
        left.add(new JScrollPane(excitations), "grow");
        left.add(new JLabel("Free parameters (the rest are held at the plan's values)"));
        left.add(freePanel);
        left.add(pulseTrain);
        left.add(response);
        left.add(new JLabel("Parameters"));
        left.add(new JScrollPane(parameters), "grow");
        left.add(new JLabel("Diagnostics"));
        left.add(new JScrollPane(diagnostics), "grow");

        JSplitPane charts = new JSplitPane(JSplitPane.VERTICAL_SPLIT, overlay, residuals);
        splits.put("fit-charts", charts);
        charts.setResizeWeight(0.68);
        JSplitPane body = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, left, charts);
        splits.put("fit", body);
        body.setResizeWeight(0);
        body.setDividerLocation(520);

        add(toolbar, "growx, wrap");
        add(status, "wmin 0, growx, wrap");
        add(check, "wmin 0, growx, wrap");
        add(body, "grow");
        setTransferHandler(new FileDropHandler(files -> {
            loadFiles(files);
            return data.loadProblem().isEmpty();
        }));
        session.addListener(this::sessionChanged);
        sessionChanged();
    }

    // ---- what the frame and tests use ---------------------------------------------------------------------------

    /**
     * The Run Fit action, enabled exactly when the panel's Run Fit button is (traces loaded and usable, a valid plan,
     * no fit running), for the window's Fit menu.
     */
    public Action runAction() {
        return runAction;
    }

    /** The Cancel Fit action, enabled only while a fit runs, for the window's Fit menu. */
    public Action cancelAction() {
        return cancelAction;
    }

    /** Starts a fit, or says in the status line why it cannot start. */
    public void runFit() {
        if (excitations.isEditing()) {
            excitations.getCellEditor().stopCellEditing();
        }
        session.startFit();
    }

    /** Loads trace files (errors go to the status line). */
    public void loadFiles(List<Path> files) {
        if (files.isEmpty()) {
            return;
        }
        if (session.load(files).isEmpty()) {
            Path parent = files.get(0).toAbsolutePath().getParent();
            if (parent != null) {
                directoryUsed.accept(parent);
            }
        }
    }

    // ---- user actions -------------------------------------------------------------------------------------------

    /** Asks for trace files with a file chooser and loads them. */
    public void loadTracesWithChooser() {
        JFileChooser chooser = new JFileChooser(lastDirectory.get().map(Path::toFile).orElse(null));
        chooser.setMultiSelectionEnabled(true);
        chooser.setFileFilter(new FileNameExtensionFilter("Trace tables (*.csv, *.tsv, *.txt, *.dat)", "csv", "tsv", "txt", "dat"));
        if (chooser.showOpenDialog(this) == JFileChooser.APPROVE_OPTION) {
            List<Path> files = new ArrayList<>();
            for (File f : chooser.getSelectedFiles()) {
                files.add(f.toPath());
            }
            if (files.isEmpty() && chooser.getSelectedFile() != null) {
                files.add(chooser.getSelectedFile().toPath());
            }
            loadFiles(files);
        }
    }

    private void pushBack() {
        PushBack p = run.applyTo(editor);
        List<String> written = new ArrayList<>();
        for (var e : p.edits()) {
            written.add(e.getKey().label() + " = " + e.getValue());
        }
        pushNote = (written.isEmpty() ? "Nothing written into the plan." : "Written into the plan as one step (Edit ▸ Undo takes it back): "
                + String.join("; ", written) + ".") + (p.notes().isEmpty() ? "" : "\n" + String.join("\n", p.notes()));
        sessionChanged();
    }

    // ---- redraw -------------------------------------------------------------------------------------------------

    private void sessionChanged() {
        FitRun.RunState state = run.state();
        boolean running = state == FitRun.RunState.RUNNING;
        Optional<String> blocked = session.runProblem();
        load.setEnabled(true);
        runAction.setEnabled(!running && blocked.isEmpty());
        fit.setToolTipText(blocked.map(b -> "Cannot fit yet: " + b).orElse("Fit the loaded traces (Ctrl+R)"));
        cancelAction.setEnabled(running);
        cancel.setToolTipText(running ? "Stop the fit; the best point it has met is shown" : "No fit is running");
        showProgress();
        if (running && !clock.isRunning()) {
            clock.start();
        } else if (!running) {
            clock.stop();
        }
        String checkLine = session.checkLine();
        check.setText(checkLine);
        check.setToolTipText(checkLine.isEmpty() ? null : checkLine);
        Color warn = UIManager.getColor("Ladderkin.verdict.fail");
        check.setForeground(checkLine.startsWith("⚠") && warn != null ? warn : UIManager.getColor("Label.foreground"));
        PushBack p = run.pushBack();
        push.setEnabled(!p.edits().isEmpty());
        push.setToolTipText("<html>" + escape(String.join("<br>", pushLines(p))) + "</html>");

        String line = session.statusLine();
        status.setText(line.isEmpty() ? " " : line);
        status.setToolTipText(line.isEmpty() ? null : line);
        Color fail = UIManager.getColor("Ladderkin.verdict.fail");
        status.setForeground(line.startsWith("⚠") && fail != null ? fail : UIManager.getColor("Label.foreground"));

        if (!excitations.isEditing()) {
            excitationModel.fireTableDataChanged();
        }
        for (var e : freeBoxes.entrySet()) {
            e.getValue().setSelected(run.free().contains(e.getKey()));
        }
        String yieldKey = FitRun.multiplicationYield().key();
        freeBoxes.get(yieldKey).setVisible(session.multiplicationYieldOffered() || run.free().contains(yieldKey));
        FitOptions options = run.options();
        pulseTrain.setSelected(options.pulseTrain());
        response.setSelected(options.instrumentResponse());
        Optional<String> planResponse = session.preview().planResponse();
        response.setEnabled(planResponse.isPresent() || options.instrumentResponse());
        response.setText(planResponse.map(r -> "Plan's instrument response: " + r)
                .orElse("Instrument response (the plan has no TA instrument)"));
        session.planRepetitionRateHz().ifPresent(hz -> pulseTrain.setText("Pulse-train steady state at "
                + Quantity.formatBest(hz, Dimension.FREQUENCY, 3) + " (the plan's rate)"));
        overlay.show(session.overlayChart());
        residuals.show(session.residualChart());
        parameterModel.rows(session.parameterRows());
        List<String> lines = new ArrayList<>(session.diagnostics());
        if (!pushNote.isEmpty()) {
            lines.add(pushNote);
        }
        diagnostics.setText(String.join("\n", lines));
        diagnostics.setCaretPosition(0);
    }

    private void showProgress() {
        String text = run.progressText();
        progress.setText(text.isEmpty() ? " " : text);
        progress.setToolTipText(text.isEmpty() ? null : text);
    }

    @Override
    public void removeNotify() {
        clock.stop();
        super.removeNotify();
    }

    private static List<String> pushLines(PushBack p) {
        List<String> lines = new ArrayList<>();
        for (var e : p.edits()) {
            lines.add("sets " + e.getKey().label() + " to " + e.getValue());
        }
        lines.addAll(p.notes());
        return lines;
    }

    private static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("&lt;br&gt;", "<br>");
    }

    // ---- tables -------------------------------------------------------------------------------------------------

    /** Trace label and its editable excitation text. */
    private final class ExcitationModel extends AbstractTableModel {
        @Override
        public int getRowCount() {
            return data.traceCount();
        }

        @Override
        public int getColumnCount() {
            return 2;
        }

        @Override
        public String getColumnName(int c) {
            return c == 0 ? "Trace" : "Excitation";
        }

        @Override
        public Object getValueAt(int r, int c) {
            return c == 0 ? data.label(r) : data.excitationText(r);
        }

        @Override
        public boolean isCellEditable(int r, int c) {
            return c == 1;
        }

        @Override
        public void setValueAt(Object value, int r, int c) {
            session.setExcitation(r, value == null ? "" : value.toString());
        }
    }

    /** Marks an unusable excitation with the error colour and gives the reason as tooltip. */
    private final class ExcitationRenderer extends DefaultTableCellRenderer {
        @Override
        public Component getTableCellRendererComponent(JTable table, Object value, boolean selected, boolean focus, int row, int col) {
            Optional<String> problem = data.excitationProblem(row);
            super.getTableCellRendererComponent(table, problem.isPresent() ? "⚠ " + value : value, selected, focus, row, col);
            Color fail = UIManager.getColor("Ladderkin.verdict.fail");
            setForeground(problem.isPresent() && fail != null ? fail : selected ? table.getSelectionForeground() : table.getForeground());
            setToolTipText(problem.orElse("e.g. 2 nJ, 1e13 photons/cm², 0.3 mJ/cm² (with the pump in a sidecar) or 0.5 (⟨N⟩)"));
            return this;
        }
    }

    /** A text field that checks the excitation as the user types (outline and tooltip), committing on Enter. */
    private final class ExcitationEditor extends AbstractCellEditor implements TableCellEditor {
        private final JTextField field = new JTextField();
        private int row;

        ExcitationEditor() {
            field.setName("fit:excitation-editor");
            field.addActionListener(e -> stopCellEditing());
            field.getDocument().addDocumentListener(new DocumentListener() {
                @Override
                public void insertUpdate(DocumentEvent e) {
                    check();
                }

                @Override
                public void removeUpdate(DocumentEvent e) {
                    check();
                }

                @Override
                public void changedUpdate(DocumentEvent e) {
                    check();
                }
            });
        }

        private void check() {
            if (row >= data.traceCount()) {
                return;
            }
            Optional<String> problem = data.checkExcitation(row, field.getText());
            field.putClientProperty("JComponent.outline", problem.isPresent() ? "error" : null);
            field.setToolTipText(problem.orElse(null));
        }

        @Override
        public Object getCellEditorValue() {
            return field.getText();
        }

        @Override
        public Component getTableCellEditorComponent(JTable table, Object value, boolean selected, int r, int c) {
            row = r;
            field.setText(value == null ? "" : value.toString());
            check();
            return field;
        }
    }
}
