package org.ladderkin.gui.view;

import java.awt.event.FocusAdapter;
import java.awt.event.FocusEvent;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import javax.swing.JCheckBox;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JTextField;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import net.miginfocom.swing.MigLayout;
import org.ladderkin.gui.model.FieldSpec;
import org.ladderkin.gui.model.PlanEditor;

/**
 * A form built from a table of {@link FieldSpec}s, in titled sections. Each component is named after its field's
 * JSON path, forwards every change to the {@link PlanEditor} and shows the editor's verdict: an error outline and the
 * reason as tooltip. It holds no state of its own beyond the components.
 */
final class FieldFormPanel extends JPanel {

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
                "[right][grow, fill, 140:220:]",        // label column, field column
                "[]unrel"));                            // rows
        for (Section section : sections) {
            if (!section.title().isEmpty()) {
                JLabel title = new JLabel(section.title());
                title.putClientProperty("FlatLaf.styleClass", "h4");
                add(title, "span 2, gaptop para, wrap");
            }
            for (FieldSpec f : section.fields()) {
                Binding b = bind(f);
                JLabel label = new JLabel(f.label());
                label.setLabelFor(b.component());
                label.setToolTipText(f.help());
                add(label);
                add(b.component());
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

    private static String tooltip(FieldSpec f) {
        return f.help() + " — " + f.path();
    }

    private static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }

    private Binding bind(FieldSpec f) {
        return switch (f.kind()) {
            case CHOICE -> new ChoiceBinding(f);
            case KEY_SET -> new KeySetBinding(f);
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

        KeySetBinding(FieldSpec field) {
            this.field = field;
            panel.setName(field.path().toString());
            panel.setOpaque(false);
            for (String choice : field.choices()) {
                JCheckBox box = new JCheckBox(choice);
                box.setName(field.path() + "=" + choice);
                box.addActionListener(e -> selectionChanged());
                boxes.add(box);
                panel.add(box);
            }
        }

        private void selectionChanged() {
            List<String> selected = new ArrayList<>();
            for (JCheckBox b : boxes) {
                if (b.isSelected()) {
                    selected.add(b.getText());
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
                b.setSelected(chosen.contains(b.getText()));
            }
        }
    }
}
