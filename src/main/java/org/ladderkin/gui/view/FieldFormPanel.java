// Over 400 lines: the form and its four field bindings (text, data file, choice, key set) share the editor and the updating guard.
package org.ladderkin.gui.view;

import java.awt.event.FocusAdapter;
import java.awt.event.FocusEvent;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JFileChooser;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JTextField;
import javax.swing.Scrollable;
import javax.swing.TransferHandler;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import javax.swing.filechooser.FileNameExtensionFilter;
import net.miginfocom.swing.MigLayout;
import org.ladderkin.gui.model.FieldSpec;
import org.ladderkin.gui.model.PlanEditor;

/**
 * A form built from a table of {@link FieldSpec}s, in titled sections. Each component is named after its field's
 * JSON path, forwards every change to the {@link PlanEditor} and shows the editor's verdict: an error outline and the
 * reason as tooltip. It holds no state of its own beyond the components.
 */
final class FieldFormPanel extends JPanel implements Scrollable {

    /** A titled group of fields. */
    record Section(String title, List<FieldSpec> fields) {
    }

    private final PlanEditor editor;
    private final List<Binding> bindings = new ArrayList<>();
    private boolean updating;

    FieldFormPanel(PlanEditor editor, List<Section> sections) {
        this.editor = editor;
        build(sections);
    }

    /** Replaces every section (e.g. the instruments of a newly opened plan). */
    void rebuild(List<Section> sections) {
        removeAll();
        bindings.clear();
        build(sections);
        revalidate();
        repaint();
    }

    private void build(List<Section> sections) {
        setLayout(new MigLayout(
                "insets dialog, wrap 2, hidemode 3",   // layout
                "[right][grow, fill, 110:220:]",        // label column, field column
                "[]unrel"));                            // rows
        for (Section section : sections) {
            if (!section.title().isEmpty()) {
                JLabel title = new JLabel(section.title());
                title.putClientProperty("FlatLaf.styleClass", "h4");
                title.setToolTipText(section.title());
                // a long title is cut (full text as tooltip) rather than widening the form past its column
                add(title, "span 2, gaptop para, wmin 0, wrap");
            }
            for (FieldSpec f : section.fields()) {
                Binding b = bind(f);
                JLabel label = new JLabel(f.label());
                label.setLabelFor(b.component());
                label.setToolTipText(f.help());
                add(label);
                // combo boxes ask for their longest choice as minimum; the column decides instead
                add(b.container(), "wmin 90");
                bindings.add(b);
            }
        }
        refreshAll();
    }

    /** Re-reads every field's text from the document (after new, open, undo, redo) and its problem. */
    void refreshAll() {
        updating = true;
        try {
            for (Binding b : bindings) {
                b.show(editor.text(b.field()));
            }
        } finally {
            updating = false;
        }
        refreshProblems();
    }

    /** Re-marks every field; texts stay as typed. */
    void refreshProblems() {
        for (Binding b : bindings) {
            String problem = editor.problem(b.field()).orElse(null);
            JComponent c = b.component();
            c.putClientProperty("JComponent.outline", problem == null ? null : "error");
            c.setToolTipText(problem == null ? tooltip(b.field()) : "<html><b>" + escape(problem) + "</b><br>"
                    + escape(tooltip(b.field())) + "</html>");
        }
    }

    /** Whether any field of this form is marked invalid. */
    boolean hasProblem() {
        return firstInvalid().isPresent();
    }

    /** The first field (in form order) that is marked invalid, if any. */
    java.util.Optional<JComponent> firstInvalid() {
        for (Binding b : bindings) {
            if (editor.problem(b.field()).isPresent()) {
                return java.util.Optional.of(b.component());
            }
        }
        return java.util.Optional.empty();
    }

    /**
     * Shows in each empty text field the value the prediction used in its place (e.g. the diameter derived from the
     * first-exciton peak), or nothing; FlatLaf draws a placeholder only while the field is empty.
     *
     * @param derived text to show, by field path; fields not named lose their placeholder
     */
    void placeholders(java.util.Map<String, String> derived) {
        for (Binding b : bindings) {
            if (b.component() instanceof JTextField t) {
                String shown = derived.get(b.field().path().toString());
                t.putClientProperty("JTextField.placeholderText", shown);
            }
        }
    }

    /** The placeholder a field shows, or null (for tests). */
    static String placeholder(JComponent c) {
        Object p = c.getClientProperty("JTextField.placeholderText");
        return p == null ? null : p.toString();
    }

    // ---- Scrollable: the form takes its column's width, so it wraps into it rather than scrolling sideways ------

    @Override
    public java.awt.Dimension getPreferredScrollableViewportSize() {
        return getPreferredSize();
    }

    @Override
    public int getScrollableUnitIncrement(java.awt.Rectangle visible, int orientation, int direction) {
        return 16;
    }

    @Override
    public int getScrollableBlockIncrement(java.awt.Rectangle visible, int orientation, int direction) {
        return orientation == javax.swing.SwingConstants.VERTICAL ? visible.height - 16 : visible.width - 16;
    }

    @Override
    public boolean getScrollableTracksViewportWidth() {
        return true;
    }

    @Override
    public boolean getScrollableTracksViewportHeight() {
        return getParent() instanceof javax.swing.JViewport v && v.getHeight() > getPreferredSize().height;
    }

    private static String tooltip(FieldSpec f) {
        return f.help();
    }

    private static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }

    private Binding bind(FieldSpec f) {
        return switch (f.kind()) {
            case CHOICE -> new ChoiceBinding(f);
            case KEY_SET -> new KeySetBinding(f);
            case FILE -> new FileBinding(f);
            default -> new TextBinding(f);
        };
    }

    private void edited(FieldSpec field, String text) {
        if (!updating) {
            editor.edit(field, text);
        }
    }

    private void editFinished() {
        if (!updating) {
            editor.endEdit();
        }
    }

    /** One field's component. */
    private interface Binding {
        FieldSpec field();

        JComponent component();

        /** What the form lays out (the component, or a panel holding it and its buttons). */
        default JComponent container() {
            return component();
        }

        void show(String text);
    }

    private final class TextBinding implements Binding {
        private final FieldSpec field;
        private final JTextField text = new JTextField();

        TextBinding(FieldSpec field) {
            this.field = field;
            text.setName(field.path().toString());
            text.getDocument().addDocumentListener(new DocumentListener() {
                @Override
                public void insertUpdate(DocumentEvent e) {
                    textChanged();
                }

                @Override
                public void removeUpdate(DocumentEvent e) {
                    textChanged();
                }

                @Override
                public void changedUpdate(DocumentEvent e) {
                    textChanged();
                }
            });
            text.addFocusListener(new FocusAdapter() {
                @Override
                public void focusLost(FocusEvent e) {
                    editFinished();
                }
            });
            text.addActionListener(e -> editFinished());
        }

        private void textChanged() {
            edited(field, text.getText());
        }

        @Override
        public FieldSpec field() {
            return field;
        }

        @Override
        public JComponent component() {
            return text;
        }

        @Override
        public void show(String value) {
            if (!text.getText().equals(value)) {
                text.setText(value);
            }
        }
    }

    /**
     * A data-file field: the path as text, a button that opens a file chooser in the plan's folder, and file drops
     * onto the field or the button. The chosen file is stored relative to the plan's folder (see
     * {@link PlanEditor#fileFieldText}); the plan reader then checks its contents.
     */
    private final class FileBinding implements Binding {
        private final TextBinding text;
        private final JPanel panel = new JPanel(new MigLayout("insets 0, gap 4", "[grow, fill][]"));

        FileBinding(FieldSpec field) {
            this.text = new TextBinding(field);
            JButton browse = new JButton("Choose…");
            browse.setName(field.path() + ":choose");
            browse.setToolTipText("choose a file, or drop one on the field");
            browse.addActionListener(e -> choose());
            TransferHandler drop = new FileOrTextDropHandler(this::accept);
            text.component().setTransferHandler(drop);
            browse.setTransferHandler(drop);
            panel.setOpaque(false);
            panel.add(text.component());
            panel.add(browse);
        }

        private void choose() {
            JFileChooser chooser = new JFileChooser(editor.baseDir().toFile());
            List<String> extensions = field().choices();
            if (!extensions.isEmpty()) {
                chooser.setFileFilter(new FileNameExtensionFilter(field().label() + " (" + extensions.stream()
                        .map(x -> "*." + x).collect(java.util.stream.Collectors.joining(", ")) + ")",
                        extensions.toArray(String[]::new)));
            }
            if (chooser.showOpenDialog(panel) == JFileChooser.APPROVE_OPTION) {
                accept(chooser.getSelectedFile().toPath());
            }
        }

        private void accept(java.nio.file.Path chosen) {
            String value = editor.fileFieldText(chosen);
            text.show(value);
            editFinished();
        }

        @Override
        public FieldSpec field() {
            return text.field();
        }

        @Override
        public JComponent component() {
            return text.component();
        }

        @Override
        public JComponent container() {
            return panel;
        }

        @Override
        public void show(String value) {
            text.show(value);
        }
    }

    /** One dropped file goes to the field's chooser logic; text still pastes, copies and drags as in any field. */
    private static final class FileOrTextDropHandler extends FileDropHandler {
        private final TransferHandler textHandler = new JTextField().getTransferHandler();

        FileOrTextDropHandler(java.util.function.Consumer<java.nio.file.Path> target) {
            super(files -> {
                if (files.size() != 1) {
                    return false;
                }
                target.accept(files.get(0));
                return true;
            });
        }

        @Override
        public boolean canImport(TransferSupport support) {
            return super.canImport(support) || support.getComponent() instanceof JTextField && textHandler.canImport(support);
        }

        @Override
        public boolean importData(TransferSupport support) {
            if (super.canImport(support)) {
                return super.importData(support);
            }
            return support.getComponent() instanceof JTextField && textHandler.importData(support);
        }

        @Override
        public int getSourceActions(JComponent c) {
            return textHandler.getSourceActions(c);
        }

        @Override
        public void exportToClipboard(JComponent c, java.awt.datatransfer.Clipboard clip, int action) {
            textHandler.exportToClipboard(c, clip, action);
        }

        @Override
        public void exportAsDrag(JComponent c, java.awt.event.InputEvent e, int action) {
            textHandler.exportAsDrag(c, e, action);
        }
    }

    private final class ChoiceBinding implements Binding {
        private final FieldSpec field;
        private final JComboBox<String> combo;

        ChoiceBinding(FieldSpec field) {
            this.field = field;
            this.combo = new JComboBox<>(field.choices().toArray(String[]::new));
            combo.setName(field.path().toString());
            combo.addActionListener(e -> choiceChanged());
        }

        private void choiceChanged() {
            Object selected = combo.getSelectedItem();
            edited(field, selected == null ? "" : selected.toString());
            editFinished();
        }

        @Override
        public FieldSpec field() {
            return field;
        }

        @Override
        public JComponent component() {
            return combo;
        }

        @Override
        public void show(String value) {
            combo.setSelectedItem(field.choices().contains(value) ? value : null);
        }
    }

    private final class KeySetBinding implements Binding {
        private final FieldSpec field;
        private final JPanel panel = new JPanel(new MigLayout("insets 0, wrap 1, gap 0 2"));
        private final List<JCheckBox> boxes = new ArrayList<>();
        /** The choice as the file spells it; the box shows it in words. */
        private static final String KEY = "ladderkin.choice";

        KeySetBinding(FieldSpec field) {
            this.field = field;
            panel.setName(field.path().toString());
            panel.setOpaque(false);
            for (String choice : field.choices()) {
                JCheckBox box = new JCheckBox(field.choiceLabel(choice));
                box.setName(field.path() + "=" + choice);
                box.putClientProperty(KEY, choice);
                box.addActionListener(e -> selectionChanged());
                boxes.add(box);
                panel.add(box);
            }
        }

        private void selectionChanged() {
            List<String> selected = new ArrayList<>();
            for (JCheckBox b : boxes) {
                if (b.isSelected()) {
                    selected.add((String) b.getClientProperty(KEY));
                }
            }
            edited(field, String.join(", ", selected));
            editFinished();
        }

        @Override
        public FieldSpec field() {
            return field;
        }

        @Override
        public JComponent component() {
            return panel;
        }

        @Override
        public void show(String value) {
            Set<String> chosen = new LinkedHashSet<>();
            for (String part : value.split(",")) {
                chosen.add(part.strip());
            }
            for (JCheckBox b : boxes) {
                b.setSelected(chosen.contains((String) b.getClientProperty(KEY)));
            }
        }
    }
}
