package org.ladderkin.gui.view;

import java.awt.Color;
import java.awt.Component;
import java.awt.Font;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import javax.swing.Icon;
import javax.swing.UIManager;

/** A small round "!" in the error colour: marks a form tab that holds a field with a problem. */
final class ProblemIcon implements Icon {

    static final ProblemIcon INSTANCE = new ProblemIcon();
    private static final int SIZE = 12;

    private ProblemIcon() {
    }

    @Override
    public void paintIcon(Component c, Graphics g, int x, int y) {
        Graphics2D g2 = (Graphics2D) g.create();
        try {
            g2.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            Color fill = UIManager.getColor("Ladderkin.verdict.fail");
            g2.setColor(fill == null ? Color.RED : fill);
            g2.fillOval(x, y, SIZE, SIZE);
            g2.setColor(Color.WHITE);
            g2.setFont(c.getFont().deriveFont(Font.BOLD, 10f));
            var fm = g2.getFontMetrics();
            g2.drawString("!", x + (SIZE - fm.stringWidth("!")) / 2, y + (SIZE + fm.getAscent() - fm.getDescent()) / 2);
        } finally {
            g2.dispose();
        }
    }

    @Override
    public int getIconWidth() {
        return SIZE;
    }

    @Override
    public int getIconHeight() {
        return SIZE;
    }
}
