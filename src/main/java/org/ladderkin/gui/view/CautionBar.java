package org.ladderkin.gui.view;

import java.util.List;
import javax.swing.BorderFactory;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.UIManager;
import net.miginfocom.swing.MigLayout;
import org.ladderkin.report.Cautions;

/**
 * The safety cautions, always visible at the top of the window: the first sentence of each, the full text as its
 * tooltip. The laser caution shows even before the first prediction.
 */
final class CautionBar extends JPanel {

    private List<String> cautions = List.of(Cautions.LASER);
    private boolean stale;

    CautionBar() {
        setName("cautions");
        show(cautions);
    }

    void show(List<String> next) {
        cautions = List.copyOf(next);
        removeAll();
        setLayout(new MigLayout("insets 4 8 4 8, wrap 1, gap 0 2", "[grow, fill]"));
        for (String c : cautions) {
            // the laser caution holds for every plan; the others were decided for the plan they came with
            boolean old = stale && !Cautions.LASER.equals(c);
            JLabel l = new JLabel((old ? "⚠ (stale) " : "⚠ ") + firstSentence(c));
            l.setToolTipText("<html><p width=520>" + (old ? "From the previous results, not the plan on screen. " : "")
                    + c + "</p></html>");
            l.setForeground(UIManager.getColor(old ? "Label.disabledForeground" : "Ladderkin.caution.foreground"));
            add(l);
        }
        applyColours();
        revalidate();
        repaint();
    }

    /** Marks the cautions other than the laser one as belonging to results that are no longer the plan's. */
    void stale(boolean next) {
        if (next != stale) {
            stale = next;
            show(cautions);
        }
    }

    boolean stale() {
        return stale;
    }

    List<String> cautions() {
        return cautions;
    }

    @Override
    public void updateUI() {
        super.updateUI();
        if (cautions != null) {
            show(cautions);
        }
    }

    private void applyColours() {
        setBackground(UIManager.getColor("Ladderkin.caution.background"));
        setBorder(BorderFactory.createMatteBorder(0, 0, 1, 0, UIManager.getColor("Component.borderColor")));
    }

    static String firstSentence(String text) {
        int dot = text.indexOf(". ");
        return dot < 0 ? text : text.substring(0, dot + 1);
    }
}
