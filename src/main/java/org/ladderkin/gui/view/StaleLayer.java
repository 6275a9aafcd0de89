package org.ladderkin.gui.view;

import java.awt.AlphaComposite;
import java.awt.Color;
import java.awt.Graphics;
import java.awt.Graphics2D;
import javax.swing.JComponent;
import javax.swing.UIManager;
import javax.swing.plaf.LayerUI;

/**
 * Washes out results that no longer belong to the plan on screen (a previous plan's, or the last valid version of a
 * plan that now has errors): they stay readable and hoverable, but cannot be mistaken for the current plan's.
 */
final class StaleLayer extends LayerUI<JComponent> {

    /** How much of the panel colour is laid over stale results. */
    private static final float WASH = 0.55f;
    private boolean stale;

    boolean stale() {
        return stale;
    }

    void stale(boolean next, JComponent layer) {
        if (next != stale) {
            stale = next;
            layer.repaint();
        }
    }

    @Override
    public void paint(Graphics g, JComponent c) {
        super.paint(g, c);
        if (!stale) {
            return;
        }
        Graphics2D g2 = (Graphics2D) g.create();
        try {
            Color wash = UIManager.getColor("Panel.background");
            g2.setComposite(AlphaComposite.getInstance(AlphaComposite.SRC_OVER, WASH));
            g2.setColor(wash == null ? Color.LIGHT_GRAY : wash);
            g2.fillRect(0, 0, c.getWidth(), c.getHeight());
        } finally {
            g2.dispose();
        }
    }
}
