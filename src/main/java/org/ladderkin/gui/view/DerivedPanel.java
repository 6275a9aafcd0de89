package org.ladderkin.gui.view;

import java.util.List;
import javax.swing.JLabel;
import javax.swing.JPanel;
import net.miginfocom.swing.MigLayout;
import org.ladderkin.gui.model.Prediction;

/** Numbers derived from the plan; hovering over one shows the formula and the values that went into it. */
final class DerivedPanel extends JPanel {

    DerivedPanel() {
        setName("derived");
        show(List.of());
    }

    void show(List<Prediction.DerivedNumber> numbers) {
        removeAll();
        setLayout(new MigLayout(
                "insets dialog, wrap 2",  // layout
                "[right][grow]",           // label, value
                ""));
        for (Prediction.DerivedNumber n : numbers) {
            JLabel label = new JLabel(n.label());
            JLabel value = new JLabel(n.value());
            value.setName("derived:" + n.label());
            label.setToolTipText(n.formula());
            value.setToolTipText(n.formula());
            value.putClientProperty("FlatLaf.styleClass", "monospaced");
            add(label);
            add(value);
        }
        revalidate();
        repaint();
    }
}
