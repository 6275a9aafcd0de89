// Over 400 lines: the one planner window wires its menus, tabs, shortcuts and window state in one place.
package org.ladderkin.gui.view;

import java.awt.BorderLayout;
import java.awt.Rectangle;
import java.awt.Toolkit;
import java.awt.event.ActionEvent;
import java.awt.event.InputEvent;
import java.awt.event.KeyEvent;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import javax.swing.AbstractAction;
import javax.swing.Action;
import javax.swing.BorderFactory;
import javax.swing.ButtonGroup;
import javax.swing.JComponent;
import javax.swing.JFileChooser;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JMenuItem;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JRadioButtonMenuItem;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTabbedPane;
import javax.swing.KeyStroke;
import javax.swing.SwingUtilities;
import javax.swing.Timer;
import javax.swing.filechooser.FileNameExtensionFilter;
import net.miginfocom.swing.MigLayout;
import org.ladderkin.gui.app.GuiPrefs;
import org.ladderkin.gui.app.Theme;
import org.ladderkin.gui.chart.ChartExport;
import org.ladderkin.gui.model.Autosaver;
import org.ladderkin.gui.model.FitSession;
import org.ladderkin.gui.model.PlanEditor;
import org.ladderkin.gui.model.PlanFiles;
import org.ladderkin.gui.model.PlanForms;
import org.ladderkin.gui.model.Prediction;
import org.ladderkin.gui.model.PredictionReport;
import org.ladderkin.gui.model.PredictionSource;
import org.ladderkin.gui.model.ErrorBudgetService;
import org.ladderkin.gui.model.RecomputeService;
import org.ladderkin.gui.model.RecoveryStore;
import org.ladderkin.gui.model.UnsavedChanges;
import org.ladderkin.io.AtomicFiles;
import org.ladderkin.io.InputException;
import org.ladderkin.plan.PlanInputs;
import org.ladderkin.report.ChartSpec;

/**
 * The planner window: plan forms on the left, the live charts in the centre, risks and derived numbers below, the
 * safety cautions on top and a status bar. All state lives in the {@link PlanEditor}; this class lays out, forwards
 * user actions and redraws on the editor's events and on delivered predictions.
 */
public final class PlannerFrame extends JFrame {

    /**
     * Wait after the last keystroke before recomputing (ms). A newer edit cancels an older computation anyway, so the
     * wait only spares work during fast typing; kept short because a warm prediction takes 20–50 ms and the charts
     * should follow within 150 ms of the last keystroke.
     */
    static final int DEBOUNCE_MS = 40;
    /** How often unsaved changes are copied to the recovery folder (ms). */
    static final int AUTOSAVE_MS = 20_000;
    private static final String TITLE = "ladderkin planner";

    private final GuiPrefs prefs;
    private final RecoveryStore recovery;
    private final PredictionSource source;
    private java.util.function.Consumer<RecoveryStore.Recovered> windowOpener;
    private final PlanEditor editor = new PlanEditor();
    private final Autosaver autosaver;
    private final RecomputeService recompute;
    /** The design search takes seconds: it starts once edits pause this long, so typing does not restart it each key. */
    private static final long BUDGET_PAUSE_MS = 600;
    private long budgetRequested;
    private final Timer autosaveTimer;

    private final FieldFormPanel sampleForm;
    private final FieldFormPanel laserForm;
    private final FieldFormPanel instrumentsForm;
    private final FieldFormPanel goalsForm;
    private final FieldFormPanel modelForm;
    private final FitSession fitSession = new FitSession(SwingUtilities::invokeLater);
    private final FitPanel fitPanel;
    private final JTabbedPane centreTabs = new JTabbedPane();
    private final ChartsPanel charts = new ChartsPanel(this::exportChart);
    private final RiskTable risks = new RiskTable();
    private final ErrorBudgetTable budgetTable = new ErrorBudgetTable();
    private final JLabel budgetStatus = new JLabel(" ");
    private final ErrorBudgetService budget;
    private final DerivedPanel derived = new DerivedPanel();
    private final CautionBar cautions = new CautionBar();
    private final JLabel planStatus = new JLabel(" ");
    private final JLabel predictionStatus = new JLabel(" ");
    private final JLabel fileStatus = new JLabel(" ");
    private final JTabbedPane formTabs = new JTabbedPane();
    private final StaleLayer staleLayer = new StaleLayer();
    private javax.swing.JLayer<JComponent> resultsLayer;
    /** Above the results: why they are washed out, or why there are none. */
    private final JLabel staleNote = new JLabel(" ");
    private final JSplitPane mainSplit;
    /** Split panes whose divider positions are remembered between runs, by name. */
    private final java.util.Map<String, JSplitPane> splits = new java.util.LinkedHashMap<>();
    private final JMenu recentMenu = new JMenu("Open Recent");
    private final List<Action> exportActions = new ArrayList<>();
    private Action undoAction;
    private Action redoAction;
    private String instrumentShape = "";
    private Prediction prediction;
    private PlanInputs predictedFor;
    private PlanInputs requested;
    private long editNanos;
    private long deliveredCount;
    /** Counts the plans this window has held (new, open, restore): results of an earlier one are stale. */
    private int planGeneration;
    private int requestedGeneration;
    private int shownGeneration;

    /**
     * @param prefs    where theme, window bounds and recent files are remembered
     * @param recovery where the recovery copy is kept
     * @param source   what computes the prediction (on a background thread)
     */
    public PlannerFrame(GuiPrefs prefs, RecoveryStore recovery, PredictionSource source) {
        super(TITLE);
        this.prefs = prefs;
        this.recovery = recovery;
        this.source = source;
        this.windowOpener = this::openInNewWindow;
        this.autosaver = new Autosaver(editor, recovery, Clock.systemUTC());
        this.recompute = new RecomputeService(source, DEBOUNCE_MS, SwingUtilities::invokeLater, this::predictionArrived);
        this.budget = new ErrorBudgetService(BUDGET_PAUSE_MS, SwingUtilities::invokeLater, this::budgetArrived);
        this.autosaveTimer = new Timer(AUTOSAVE_MS, e -> autosaveTick());

        sampleForm = new FieldFormPanel(editor, List.of(new FieldFormPanel.Section("", PlanForms.SAMPLE)));
        laserForm = new FieldFormPanel(editor, List.of(new FieldFormPanel.Section("", PlanForms.LASER)));
        instrumentsForm = new FieldFormPanel(editor, instrumentSections());
        goalsForm = new FieldFormPanel(editor, List.of(new FieldFormPanel.Section("", PlanForms.GOALS_AND_LIMITS)));
        modelForm = new FieldFormPanel(editor, List.of(new FieldFormPanel.Section(
                "Replacing the material's values (blank: derived)", PlanForms.MODEL)));
        fitPanel = new FitPanel(fitSession, editor, prefs::lastDirectory, prefs::lastDirectory);
        fitPanel.offerChartExport(this::exportChart);

        JTabbedPane forms = formTabs;
        forms.setName("forms");
        // short titles, so the five tabs fit the form column; the long names are the tooltips
        forms.addTab("Sample", null, scroll(sampleForm), "Sample");
        forms.addTab("Laser", null, scroll(laserForm), "Laser & geometry");
        forms.addTab("Instruments", null, scroll(instrumentsForm), "Instruments");
        forms.addTab("Goals", null, scroll(goalsForm), "Goals & limits");
        forms.addTab("Model", null, scroll(modelForm), "Model: values that replace the ones derived from the material");
        TabFit.install(forms);
        TabFit.install(charts);

        JTabbedPane lower = new JTabbedPane();
        lower.setName("lower");
        lower.addTab("Risks", new JScrollPane(risks));
        lower.addTab("Derived numbers", scroll(derived));
        JPanel budgetPanel = new JPanel(new java.awt.BorderLayout());
        budgetStatus.setName("errorBudgetStatus");
        budgetPanel.add(budgetStatus, java.awt.BorderLayout.NORTH);
        budgetPanel.add(new JScrollPane(budgetTable), java.awt.BorderLayout.CENTER);
        lower.addTab("Error budget", budgetPanel);
        // the split starts at the preferred heights: charts get most of the room
        charts.setPreferredSize(new java.awt.Dimension(760, 540));
        lower.setPreferredSize(new java.awt.Dimension(760, 190));
        JSplitPane centre = new JSplitPane(JSplitPane.VERTICAL_SPLIT, charts, lower);
        splits.put("charts", centre);
        centre.setResizeWeight(0.72);
        centreTabs.setName("centre");
        resultsLayer = new javax.swing.JLayer<>(centre, staleLayer);
        resultsLayer.setName("results");
        JPanel prediction = new JPanel(new BorderLayout());
        staleNote.setName("prediction:stale");
        staleNote.setBorder(BorderFactory.createEmptyBorder(3, 8, 3, 8));
        staleNote.setVisible(false);
        prediction.add(staleNote, BorderLayout.NORTH);
        prediction.add(resultsLayer, BorderLayout.CENTER);
        centreTabs.addTab("Prediction", prediction);
        centreTabs.addTab("Measured data & fit", fitPanel);
        mainSplit = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, forms, centreTabs);
        splits.put("forms", mainSplit);
        splits.putAll(fitPanel.splits());
        mainSplit.setResizeWeight(0);

        JPanel content = new JPanel(new BorderLayout());
        content.add(cautions, BorderLayout.NORTH);
        content.add(mainSplit, BorderLayout.CENTER);
        content.add(statusBar(), BorderLayout.SOUTH);
        setContentPane(content);
        setJMenuBar(menus());
        // a plan file dropped on the window opens (after the unsaved-changes question)
        setTransferHandler(new FileDropHandler(files -> files.size() == 1 && mayLeave() && openFile(files.get(0))));

        editor.addListener(this::planChanged);
        setDefaultCloseOperation(DO_NOTHING_ON_CLOSE);
        addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosing(WindowEvent e) {
                quit();
            }
        });
        restoreBounds();
        planChanged(PlanEditor.Change.REPLACED, null);
        autosaveTimer.start();
    }

    // ---- what tests and start-up use ---------------------------------------------------------------------------

    /** The presentation model behind the window. */
    public PlanEditor editor() {
        return editor;
    }

    /** The prediction shown, or null before the first one arrives. */
    public Prediction prediction() {
        return prediction;
    }

    /** The fit view's state. */
    public FitSession fitSession() {
        return fitSession;
    }

    /** The fit view. */
    FitPanel fitPanel() {
        return fitPanel;
    }

    /** How many predictions have been shown. */
    public long deliveredCount() {
        return deliveredCount;
    }

    /** Opens {@code file} without asking about unsaved changes (the caller has); errors are shown in a dialog. */
    public boolean openFile(Path file) {
        planGeneration++;
        try {
            editor.open(file);
        } catch (InputException e) {
            planGeneration--;
            error("Cannot open the plan", e.getMessage());
            return false;
        }
        prefs.recentFiles(prefs.recentFiles().add(file));
        prefs.lastDirectory(file.toAbsolutePath().getParent());
        rebuildRecentMenu();
        if (!editor.check().valid()) {
            // once the form is laid out: the field to focus may be on a tab never shown yet
            SwingUtilities.invokeLater(this::goToFirstProblem);
        }
        return true;
    }

    /**
     * Offers every recovery copy that earlier sessions left without closing their windows, one question each. The
     * first copy accepted goes into this window when it holds nothing of its own yet (a clean untitled plan, or the
     * same file); every other one opens in a window of its own through {@link #setWindowOpener}. A declined copy is
     * removed; a restored one stays until its plan is saved or discarded.
     */
    public void offerRecovery() {
        boolean here = !editor.isDirty();
        for (RecoveryStore.Recovered r : recovery.readAll()) {
            String when = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm").withZone(ZoneId.systemDefault()).format(r.savedAt());
            int answer = JOptionPane.showConfirmDialog(this, "<html>Unsaved changes to " + escapeHtml(r.planName())
                            + " were kept from a session that ended on " + when + ".<br>Restore them?</html>",
                    "Restore unsaved changes", JOptionPane.YES_NO_OPTION, JOptionPane.QUESTION_MESSAGE);
            try {
                if (answer != JOptionPane.YES_OPTION) {
                    recovery.discard(r);
                } else if (here && (editor.file().isEmpty() || editor.file().get().equals(r.originalFile()))) {
                    restore(r);
                    here = false;
                } else {
                    windowOpener.accept(r);
                }
            } catch (IOException e) {
                error("Cannot use the recovery copy", r.copy() + ": " + e.getMessage());
            }
        }
    }

    /** Puts a recovered plan into this window; its copy is kept up to date here and removed once saved. */
    public void restore(RecoveryStore.Recovered r) throws IOException {
        planGeneration++;
        editor.restore(r.document(), r.originalFile());
        autosaver.adopt(r);
    }

    /** How a recovered plan that does not go into this window is shown (default: a new window on the same settings). */
    public void setWindowOpener(java.util.function.Consumer<RecoveryStore.Recovered> opener) {
        windowOpener = Objects.requireNonNull(opener, "opener");
    }

    private void openInNewWindow(RecoveryStore.Recovered r) {
        PlannerFrame other = new PlannerFrame(prefs, recovery, source);
        other.windowOpener = windowOpener;
        try {
            other.restore(r);
        } catch (IOException e) {
            error("Cannot use the recovery copy", r.copy() + ": " + e.getMessage());
        }
        other.setVisible(true);
    }

    private static String escapeHtml(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }

    // ---- editor and prediction events ---------------------------------------------------------------------------

    private void planChanged(PlanEditor.Change change, String path) {
        if (change == PlanEditor.Change.REPLACED) {
            String shape = instrumentShape();
            if (!shape.equals(instrumentShape)) {
                instrumentShape = shape;
                instrumentsForm.rebuild(instrumentSections());
            }
            for (FieldFormPanel f : forms()) {
                f.refreshAll();
            }
        } else if (change == PlanEditor.Change.EDIT) {
            for (FieldFormPanel f : forms()) {
                f.refreshProblems();
            }
        }
        if (change != PlanEditor.Change.SAVED) {
            editor.lastValid().ifPresent(fitSession::setPlan);
            editor.lastValid().ifPresent(inputs -> {
                editNanos = System.nanoTime();
                requested = inputs;
                requestedGeneration = planGeneration;
                recompute.request(inputs);
                budgetRequested = budget.request(inputs);
                budgetStatus.setText("computing the optimal design for the plan as edited (the table below is for an earlier version)…");
            });
        }
        markFormTabs();
        updateStatus();
    }

    private void budgetArrived(ErrorBudgetService.Result result) {
        if (result.generation() != budgetRequested) {
            return;
        }
        if (result.error() != null) {
            budgetTable.show(java.util.List.of());
            budgetStatus.setText("no error budget: " + result.error());
            return;
        }
        if (result.prediction() != null) {
            // the full plan of this edit: the report's numbers replace the preview
            recompute.showDesigned(result.prediction(), result.computeNanos());
        }
        budgetTable.show(result.errors());
        budgetStatus.setText(result.errors().isEmpty() ? "no transient-absorption goal to design for"
                : "expected errors of the goal parameters with the optimal design (" + result.delayPoints()
                + " delay points per trace), as in the report; hover a row for what to measure better");
    }

    private void predictionArrived(RecomputeService.Result result) {
        if (result.prediction() == null) {
            predictionStatus.setText("prediction failed: " + result.error());
            return;
        }
        prediction = result.prediction();
        predictedFor = requested;
        shownGeneration = requestedGeneration;
        charts.show(prediction.charts());
        risks.show(prediction.risks());
        derived.show(prediction.derived());
        cautions.show(prediction.cautions());
        if (deliveredCount == 0) {
            // the first cautions change the height left for the charts; lay out, then put the dividers back again
            SwingUtilities.invokeLater(this::restoreDividers);
        }
        deliveredCount++;
        double sinceEditMs = (System.nanoTime() - editNanos) / 1e6;
        predictionStatus.setText(String.format(java.util.Locale.ROOT, "charts updated %.0f ms after the change (computed in %.1f ms)",
                sinceEditMs, result.computeNanos() / 1e6));
        predictionStatus.setToolTipText("Prediction basis: " + prediction.basis());
        for (Action a : exportActions) {
            a.setEnabled(true);
        }
        updateStatus();
    }

    private void updateStatus() {
        String name = editor.displayName() + (editor.isDirty() ? " •" : "");
        setTitle(name + " — " + TITLE);
        fileStatus.setText(editor.file().map(Path::toString).orElse("untitled") + (editor.isDirty() ? " (unsaved)" : ""));
        boolean fresh = prediction != null && shownGeneration == planGeneration;
        if (editor.check().valid()) {
            boolean current = fresh && predictedFor != null && predictedFor.equals(editor.check().inputs());
            planStatus.setText(PlanStatus.readable(current ? prediction.risks() : null));
            planStatus.setForeground(current ? verdictColour(PlanStatus.worst(prediction.risks())) : null);
            planStatus.setToolTipText(current ? "the plan reads; the risk table says how it fares against its limits" : null);
        } else {
            String general = editor.generalProblem().orElse(null);
            String msg = general != null ? general : "a marked field needs attention — "
                    + editor.firstFieldProblem().orElse(editor.check().problem());
            planStatus.setText("⚠ " + msg + (editor.lastValid().isPresent() ? " — charts show the last valid plan" : ""));
            planStatus.setForeground(null);
            planStatus.setToolTipText("<html>" + escapeHtml(msg) + "<br>click to go to the first problem (F8)</html>");
        }
        updateStale(fresh);
        undoAction.setEnabled(editor.canUndo());
        redoAction.setEnabled(editor.canRedo());
        undoAction.putValue(Action.NAME, editor.undoName().map(n -> "Undo: " + n).orElse("Undo"));
        redoAction.putValue(Action.NAME, editor.redoName().map(n -> "Redo: " + n).orElse("Redo"));
    }

    // ---- user actions -------------------------------------------------------------------------------------------

    private void newPlan() {
        if (mayLeave()) {
            planGeneration++;
            clearResults();
            editor.newPlan();
        }
    }

    /** Empties charts, risks, derived numbers and the plan-specific cautions: they belonged to the plan left behind. */
    private void clearResults() {
        prediction = null;
        predictedFor = null;
        charts.show(List.of());
        risks.show(List.of());
        derived.show(List.of());
        cautions.show(List.of(org.ladderkin.report.Cautions.LASER));
        budgetTable.show(List.of());
        budgetStatus.setText(" ");
        for (Action a : exportActions) {
            a.setEnabled(false);
        }
    }

    /**
     * Washes out results that are not the current plan's and says why above them; shows the prediction's derived
     * values as placeholders only while the results are the plan's own.
     */
    private void updateStale(boolean fresh) {
        String note;
        boolean stale;
        if (prediction == null) {
            stale = false;
            note = editor.check().valid() ? null : "no results yet — the plan has errors: fill in the marked fields";
        } else if (!fresh) {
            stale = true;
            note = "stale — from the previous plan" + (editor.check().valid()
                    ? "; this plan's prediction is on its way" : "; this plan has errors");
        } else if (!editor.check().valid()) {
            stale = true;
            note = "stale — plan has errors; showing its last valid version";
        } else {
            stale = false;
            note = null;
        }
        staleLayer.stale(stale, resultsLayer);
        cautions.stale(stale && !fresh);
        staleNote.setVisible(note != null);
        staleNote.setText(note == null ? " " : "⚠ " + note);
        staleNote.setForeground(javax.swing.UIManager.getColor(stale ? "Ladderkin.verdict.warn" : "Label.foreground"));
        java.util.Map<String, String> shown = fresh ? DerivedPlaceholders.of(prediction.derived()) : java.util.Map.of();
        for (FieldFormPanel f : forms()) {
            f.placeholders(shown);
        }
    }

    /** Whether the results on screen are washed out as stale (for tests). */
    boolean resultsStale() {
        return staleLayer.stale();
    }

    /** Marks each form tab holding an invalid field with an icon and the error colour. */
    private void markFormTabs() {
        List<FieldFormPanel> all = forms();
        for (int i = 0; i < all.size() && i < formTabs.getTabCount(); i++) {
            boolean bad = all.get(i).hasProblem();
            formTabs.setIconAt(i, bad ? ProblemIcon.INSTANCE : null);
            formTabs.setForegroundAt(i, bad ? javax.swing.UIManager.getColor("Ladderkin.verdict.fail") : null);
            String name = formTabs.getTitleAt(i);
            String tip = formTabs.getToolTipTextAt(i);
            String base = tip == null ? name : tip.replace(" — holds a field with a problem", "");
            formTabs.setToolTipTextAt(i, bad ? base + " — holds a field with a problem" : base);
        }
        TabFit.fit(formTabs);
    }

    /**
     * Shows the form tab of the first field with a problem, scrolls to the field and puts the cursor in it.
     *
     * @return whether there was such a field
     */
    boolean goToFirstProblem() {
        List<FieldFormPanel> all = forms();
        for (int i = 0; i < all.size(); i++) {
            Optional<JComponent> field = all.get(i).firstInvalid();
            if (field.isPresent()) {
                formTabs.setSelectedIndex(i);
                JComponent c = field.get();
                formTabs.validate();
                c.scrollRectToVisible(new Rectangle(0, 0, c.getWidth(), c.getHeight()));
                if (!c.requestFocusInWindow()) {
                    // a focusable child (a check box of a set) takes the cursor instead
                    for (java.awt.Component child : c.getComponents()) {
                        if (child.isFocusable() && child.requestFocusInWindow()) {
                            break;
                        }
                    }
                }
                return true;
            }
        }
        return false;
    }

    private void open() {
        if (!mayLeave()) {
            return;
        }
        JFileChooser chooser = chooser();
        if (chooser.showOpenDialog(this) == JFileChooser.APPROVE_OPTION) {
            openFile(chooser.getSelectedFile().toPath());
        }
    }

    private void openRecent(Path file) {
        if (!Files.isRegularFile(file)) {
            error("Cannot open the plan", file + " no longer exists; it is removed from the list.");
            prefs.recentFiles(prefs.recentFiles().remove(file));
            rebuildRecentMenu();
            return;
        }
        if (mayLeave()) {
            openFile(file);
        }
    }

    private boolean save() {
        if (editor.file().isEmpty()) {
            return saveAs();
        }
        return write(editor.file().get());
    }

    private boolean saveAs() {
        Optional<Path> target = chooseSaveTarget();
        return target.isPresent() && write(target.get());
    }

    private boolean write(Path target) {
        try {
            editor.saveAs(target);
            autosaver.discard();
            prefs.recentFiles(prefs.recentFiles().add(target));
            rebuildRecentMenu();
            return true;
        } catch (IOException e) {
            error("Cannot save the plan", target + ": " + e.getMessage());
            return false;
        }
    }

    private Optional<Path> chooseSaveTarget() {
        JFileChooser chooser = chooser();
        editor.file().ifPresent(f -> chooser.setSelectedFile(f.toFile()));
        if (chooser.showSaveDialog(this) != JFileChooser.APPROVE_OPTION) {
            return Optional.empty();
        }
        Path target = chooser.getSelectedFile().toPath();
        if (!target.getFileName().toString().endsWith(".json")) {
            target = target.resolveSibling(target.getFileName() + ".plan.json");
        }
        if (Files.exists(target) && !target.equals(editor.file().orElse(null))
                && JOptionPane.showConfirmDialog(this, target + " exists. Replace it?", "Replace file",
                JOptionPane.OK_CANCEL_OPTION, JOptionPane.WARNING_MESSAGE) != JOptionPane.OK_OPTION) {
            return Optional.empty();
        }
        prefs.lastDirectory(target.toAbsolutePath().getParent());
        return Optional.of(target);
    }

    /** File ▸ Export Chart: the selected prediction chart, or the measured-data chart when the fit tab is in front. */
    private void exportChart(ChartExport.Format format) {
        Optional<ChartSpec> spec = centreTabs.getSelectedComponent() == fitPanel && fitSession.data().dataset().isPresent()
                ? Optional.of(fitSession.overlayChart()) : charts.selected();
        spec.ifPresent(s -> exportChart(s, format));
    }

    private void exportChart(ChartSpec spec, ChartExport.Format format) {
        JFileChooser chooser = new JFileChooser(prefs.lastDirectory().map(Path::toFile).orElse(null));
        chooser.setFileFilter(new FileNameExtensionFilter(format.description(), format.extension()));
        chooser.setSelectedFile(new File(slug(spec.title()) + "." + format.extension()));
        var size = new org.ladderkin.gui.chart.ImageSizePanel(format == ChartExport.Format.PNG);
        if (format != ChartExport.Format.CSV) {
            chooser.setAccessory(size);
        }
        if (chooser.showSaveDialog(this) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        Path target = format.withExtension(chooser.getSelectedFile().toPath());
        try {
            ChartExport.write(spec, format, target, size.imageSize());
            predictionStatus.setText("exported " + target.getFileName());
        } catch (IOException e) {
            error("Cannot export the chart", target + ": " + e.getMessage());
        }
    }

    private void exportReport() {
        if (prediction == null || predictedFor == null) {
            return;
        }
        JFileChooser chooser = new JFileChooser(prefs.lastDirectory().map(Path::toFile).orElse(null));
        chooser.setFileFilter(new FileNameExtensionFilter("HTML page", "html"));
        chooser.setSelectedFile(new File(editor.displayName().replaceAll("(\\.plan)?\\.json$", "") + "-planner.html"));
        if (chooser.showSaveDialog(this) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        Path target = chooser.getSelectedFile().toPath();
        if (!target.getFileName().toString().endsWith(".html")) {
            target = target.resolveSibling(target.getFileName() + ".html");
        }
        String source = editor.file().map(Path::toString).orElse("untitled plan");
        try {
            AtomicFiles.writeString(target, PredictionReport.html(predictedFor, source, prediction));
            predictionStatus.setText("exported " + target.getFileName());
        } catch (IOException e) {
            error("Cannot export the report", target + ": " + e.getMessage());
        }
    }

    private void themeSelected(Theme theme) {
        theme.switchTo();
        prefs.theme(theme);
    }

    /**
     * Stops the background work with the window, however it goes away (quit, or a caller disposing it): a design search
     * left running would hold a core for seconds after its window is gone.
     */
    @Override
    public void dispose() {
        recompute.close();
        budget.close();
        autosaveTimer.stop();
        try {
            // after quit the copy is gone already; a window disposed without quit leaves its copy to be offered
            autosaver.release();
        } catch (IOException e) {
            // the lock goes with the process at the latest
        }
        super.dispose();
    }

    /** Closes the window after the unsaved-changes question; remembers the layout. */
    public void quit() {
        if (!mayLeave()) {
            return;
        }
        rememberBounds();
        autosaveTimer.stop();
        recompute.close();
        budget.close();
        fitSession.close();
        try {
            autosaver.discard();
        } catch (IOException e) {
            // the copy stays and is offered next time, which is harmless
        }
        dispose();
    }

    private boolean mayLeave() {
        try {
            return UnsavedChanges.mayProceed(editor, this::askAboutUnsaved, this::chooseSaveTarget);
        } catch (IOException e) {
            error("Cannot save the plan", e.getMessage());
            return false;
        }
    }

    private UnsavedChanges.Answer askAboutUnsaved(String planName) {
        Object[] options = {"Save", "Don't Save", "Cancel"};
        int answer = JOptionPane.showOptionDialog(this, "Save the changes to " + planName + "?", "Unsaved changes",
                JOptionPane.YES_NO_CANCEL_OPTION, JOptionPane.WARNING_MESSAGE, null, options, options[0]);
        return switch (answer) {
            case 0 -> UnsavedChanges.Answer.SAVE;
            case 1 -> UnsavedChanges.Answer.DISCARD;
            default -> UnsavedChanges.Answer.CANCEL;
        };
    }

    /** Writes the recovery copy now instead of at the next timer tick (for tests). */
    void autosaveNow() {
        autosaveTick();
    }

    private void autosaveTick() {
        try {
            autosaver.tick();
        } catch (IOException e) {
            predictionStatus.setText("autosave failed: " + e.getMessage());
        }
    }

    // ---- layout helpers -----------------------------------------------------------------------------------------

    private JMenuBar menus() {
        int menuKey = Toolkit.getDefaultToolkit().getMenuShortcutKeyMaskEx();
        JMenuBar bar = new JMenuBar();

        JMenu file = new JMenu("File");
        file.setMnemonic(KeyEvent.VK_F);
        file.add(action("New", KeyStroke.getKeyStroke(KeyEvent.VK_N, menuKey), this::newPlan));
        file.add(action("Open…", KeyStroke.getKeyStroke(KeyEvent.VK_O, menuKey), this::open));
        file.add(recentMenu);
        rebuildRecentMenu();
        file.addSeparator();
        file.add(action("Save", KeyStroke.getKeyStroke(KeyEvent.VK_S, menuKey), this::save));
        file.add(action("Save As…", KeyStroke.getKeyStroke(KeyEvent.VK_S, menuKey | InputEvent.SHIFT_DOWN_MASK), this::saveAs));
        file.addSeparator();
        JMenu export = new JMenu("Export Chart");
        for (ChartExport.Format f : ChartExport.Format.values()) {
            Action a = action("Selected chart as " + f.name() + "…", null, () -> exportChart(f));
            a.setEnabled(false);
            exportActions.add(a);
            export.add(a).setName("export:" + f.name());
        }
        file.add(export);
        Action report = action("Export Report (HTML)…", KeyStroke.getKeyStroke(KeyEvent.VK_E, menuKey), this::exportReport);
        report.setEnabled(false);
        exportActions.add(report);
        file.add(report);
        file.addSeparator();
        file.add(action("Quit", KeyStroke.getKeyStroke(KeyEvent.VK_Q, menuKey), this::quit));
        bar.add(file);

        JMenu edit = new JMenu("Edit");
        edit.setMnemonic(KeyEvent.VK_E);
        undoAction = action("Undo", KeyStroke.getKeyStroke(KeyEvent.VK_Z, menuKey), () -> {
            if (editor.canUndo()) {
                editor.undo();
            }
        });
        redoAction = action("Redo", KeyStroke.getKeyStroke(KeyEvent.VK_Y, menuKey), () -> {
            if (editor.canRedo()) {
                editor.redo();
            }
        });
        edit.add(undoAction);
        edit.add(redoAction);
        edit.addSeparator();
        edit.add(action("Go to First Problem", KeyStroke.getKeyStroke(KeyEvent.VK_F8, 0), this::goToFirstProblem))
                .setName("menu:first-problem");
        // Ctrl+Shift+Z also redoes, as many editors do.
        getRootPane().getInputMap(JComponent.WHEN_IN_FOCUSED_WINDOW)
                .put(KeyStroke.getKeyStroke(KeyEvent.VK_Z, menuKey | InputEvent.SHIFT_DOWN_MASK), "redo");
        getRootPane().getActionMap().put("redo", redoAction);
        bar.add(edit);

        JMenu fitMenu = new JMenu("Fit");
        fitMenu.setMnemonic(KeyEvent.VK_I);
        fitMenu.add(action("Load Traces…", KeyStroke.getKeyStroke(KeyEvent.VK_L, menuKey), () -> {
            showFitView();
            fitPanel.loadTracesWithChooser();
        })).setName("menu:fit-load");
        // the menu items follow the panel's own actions, so they are enabled exactly when its buttons are
        Action runFit = fitPanel.runAction();
        fitMenu.add(new javax.swing.JMenuItem(new AbstractAction("Run Fit") {
            {
                putValue(Action.ACCELERATOR_KEY, KeyStroke.getKeyStroke(KeyEvent.VK_R, menuKey));
                setEnabled(runFit.isEnabled());
                runFit.addPropertyChangeListener(e -> {
                    if ("enabled".equals(e.getPropertyName())) {
                        setEnabled(runFit.isEnabled());
                    }
                });
            }

            @Override
            public void actionPerformed(java.awt.event.ActionEvent e) {
                showFitView();
                runFit.actionPerformed(e);
            }
        })).setName("menu:fit-run");
        fitMenu.add(fitPanel.cancelAction()).setName("menu:fit-cancel");
        bar.add(fitMenu);

        JMenu view = new JMenu("View");
        view.setMnemonic(KeyEvent.VK_V);
        ButtonGroup themes = new ButtonGroup();
        for (Theme t : Theme.values()) {
            JRadioButtonMenuItem item = new JRadioButtonMenuItem(t.label() + " theme");
            item.setName("theme:" + t.name());
            item.setSelected(t == prefs.theme());
            item.addActionListener(e -> themeSelected(t));
            themes.add(item);
            view.add(item);
        }
        view.addSeparator();
        view.add(action("Sample Series…", null, this::openSampleSeries)).setName("menu:sample-series");
        bar.add(view);

        JMenu help = new JMenu("Help");
        help.setMnemonic(KeyEvent.VK_H);
        help.add(action("Using the Planner", KeyStroke.getKeyStroke(KeyEvent.VK_F1, 0), () -> HelpDialogs.using(this)))
                .setName("help:using");
        help.add(action("About ladderkin", null, () -> HelpDialogs.about(this))).setName("help:about");
        bar.add(help);
        return bar;
    }

    /** The archive's samples and trend; "plan the next size" sets this plan's diameter (and drops a first-peak size). */
    private void openSampleSeries() {
        new org.ladderkin.gui.series.SampleSeriesWindow(() -> editor.lastValid().map(p -> p.sample().spec().name()).orElse(null),
                nm -> editor.editAll(PlanForms.SAMPLE.stream().filter(f -> f.path().toString().equals("sample.diameter")
                        || f.path().toString().equals("sample.firstExcitonPeak")).map(f -> java.util.Map.entry(f,
                        f.path().toString().equals("sample.diameter") ? String.format(java.util.Locale.ROOT, "%.2f nm", nm) : ""))
                        .toList())).setVisible(true);
    }

    private void showFitView() {
        centreTabs.setSelectedComponent(fitPanel);
    }

    private void rebuildRecentMenu() {
        recentMenu.removeAll();
        for (Path p : prefs.recentFiles().files()) {
            JMenuItem item = new JMenuItem(PlanFiles.menuLabel(p));
            item.setToolTipText(p.toString());
            item.addActionListener(e -> openRecent(p));
            recentMenu.add(item);
        }
        recentMenu.setEnabled(recentMenu.getItemCount() > 0);
    }

    private static Action action(String name, KeyStroke key, Runnable run) {
        Action a = new AbstractAction(name) {
            @Override
            public void actionPerformed(ActionEvent e) {
                run.run();
            }
        };
        if (key != null) {
            a.putValue(Action.ACCELERATOR_KEY, key);
        }
        return a;
    }

    private JPanel statusBar() {
        JPanel bar = new JPanel(new MigLayout("insets 3 8 3 8", "[grow 60, left]16[grow 40, left]16[right]"));
        bar.setBorder(BorderFactory.createMatteBorder(1, 0, 0, 0, javax.swing.UIManager.getColor("Component.borderColor")));
        planStatus.setName("status:plan");
        planStatus.addMouseListener(new java.awt.event.MouseAdapter() {
            @Override
            public void mouseClicked(java.awt.event.MouseEvent e) {
                if (!editor.check().valid()) {
                    goToFirstProblem();
                }
            }
        });
        predictionStatus.setName("status:prediction");
        fileStatus.setName("status:file");
        bar.add(planStatus, "wmin 0");
        bar.add(predictionStatus, "wmin 0");
        bar.add(fileStatus, "wmin 0");
        return bar;
    }

    private static JScrollPane scroll(JComponent c) {
        JScrollPane s = new JScrollPane(c);
        s.setBorder(BorderFactory.createEmptyBorder());
        s.getVerticalScrollBar().setUnitIncrement(16);
        return s;
    }

    private List<FieldFormPanel> forms() {
        return List.of(sampleForm, laserForm, instrumentsForm, goalsForm, modelForm);
    }

    private List<FieldFormPanel.Section> instrumentSections() {
        var doc = editor.document();
        List<FieldFormPanel.Section> sections = new ArrayList<>();
        for (int i = 0; i < PlanForms.instrumentCount(doc); i++) {
            sections.add(new FieldFormPanel.Section("Instrument " + (i + 1) + ": " + PlanForms.instrumentKind(doc, i),
                    PlanForms.instrument(doc, i)));
        }
        return sections;
    }

    private String instrumentShape() {
        var doc = editor.document();
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < PlanForms.instrumentCount(doc); i++) {
            b.append(PlanForms.instrumentKind(doc, i)).append(';');
        }
        return b.toString();
    }

    private JFileChooser chooser() {
        JFileChooser chooser = new JFileChooser(prefs.lastDirectory().map(Path::toFile).orElse(null));
        chooser.addChoosableFileFilter(new FileNameExtensionFilter("All JSON files (*.json)", "json"));
        // not every .json is a plan: trace sidecars, samples and materials sit beside plans
        chooser.setFileFilter(new javax.swing.filechooser.FileFilter() {
            @Override
            public boolean accept(java.io.File f) {
                return PlanFiles.listed(f.toPath());
            }

            @Override
            public String getDescription() {
                return "Campaign plans (*.plan.json, or a plan's schema)";
            }
        });
        return chooser;
    }

    private void restoreBounds() {
        Optional<Rectangle> bounds = prefs.bounds();
        Rectangle screen = getGraphicsConfiguration().getBounds();
        if (bounds.isPresent() && screen.intersects(bounds.get())) {
            setBounds(bounds.get());
        } else {
            setSize(Math.min(1360, screen.width), Math.min(860, screen.height));
            setLocationRelativeTo(null);
        }
        if (prefs.maximized()) {
            setExtendedState(MAXIMIZED_BOTH);
        }
        mainSplit.setDividerLocation(430);
        splits.forEach((name, split) -> split.setName("split:" + name));
        // put the dividers back once the window has its real size: a resize before that would move them again
        addWindowListener(new WindowAdapter() {
            @Override
            public void windowOpened(WindowEvent e) {
                restoreDividers();
            }
        });
    }

    /** Puts every divider where it was last left (those never stored keep their default). */
    private void restoreDividers() {
        splits.forEach((name, split) -> {
            int px = prefs.divider(name);
            if (px > 50) {
                split.setDividerLocation(px);
            }
        });
    }

    private void rememberBounds() {
        boolean maximized = (getExtendedState() & MAXIMIZED_BOTH) == MAXIMIZED_BOTH;
        prefs.maximized(maximized);
        if (!maximized) {
            prefs.bounds(getBounds());
        }
        splits.forEach((name, split) -> {
            // a split on a tab never shown has no location yet; keep what was stored
            if (split.getDividerLocation() > 0) {
                prefs.divider(name, split.getDividerLocation());
            }
        });
    }

    private static java.awt.Color verdictColour(org.ladderkin.observe.Verdict v) {
        return v == org.ladderkin.observe.Verdict.PASS ? null
                : javax.swing.UIManager.getColor("Ladderkin.verdict." + v.name().toLowerCase(java.util.Locale.ROOT));
    }

    private void error(String title, String message) {
        JOptionPane.showMessageDialog(this, message, title, JOptionPane.ERROR_MESSAGE);
    }

    private static String slug(String title) {
        String s = title.toLowerCase(java.util.Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("(^-|-$)", "");
        return s.length() > 48 ? s.substring(0, 48) : s;
    }
}
