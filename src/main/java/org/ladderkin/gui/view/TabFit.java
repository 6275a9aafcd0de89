package org.ladderkin.gui.view;

import java.awt.Component;
import java.awt.FontMetrics;
import java.awt.Insets;
import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;
import java.awt.event.ContainerAdapter;
import java.awt.event.ContainerEvent;
import javax.swing.Icon;
import javax.swing.JTabbedPane;
import javax.swing.UIManager;

/**
 * Keeps every tab of a tabbed pane in one visible row: the pane scrolls rather than wraps (two rows swap places when a
 * tab is picked), and when the titles do not fit the widest tabs are capped at a common width, their titles cut with
 * an ellipsis (the full title stays in the tab's tooltip). Short tabs keep their width, so only long titles are cut.
 */
final class TabFit {

    /** FlatLaf's cap on a tab's width (px); longer titles are cut with an ellipsis. */
    static final String MAXIMUM_TAB_WIDTH = "JTabbedPane.maximumTabWidth";
    /** FlatLaf's padding inside a tab, per pane. */
    static final String TAB_INSETS = "JTabbedPane.tabInsets";
    /** Room kept free beside the last tab for rounding in the look and feel's own measuring. */
    private static final int SLACK = 10;
    /** Narrower than this a tab shows too little of its title to be told apart; the pane scrolls instead. */
    private static final int SMALLEST_CAP = 48;

    private TabFit() {
    }

    /** Fits {@code tabs} now and whenever it is resized or its tabs change. */
    static void install(JTabbedPane tabs) {
        tabs.setTabLayoutPolicy(JTabbedPane.SCROLL_TAB_LAYOUT);
        // narrower padding than the theme's 12 px a side: room for one more title before any is cut
        tabs.putClientProperty(TAB_INSETS, new Insets(4, 8, 4, 8));
        tabs.addComponentListener(new ComponentAdapter() {
            @Override
            public void componentResized(ComponentEvent e) {
                fit(tabs);
            }
        });
        tabs.addContainerListener(new ContainerAdapter() {
            @Override
            public void componentAdded(ContainerEvent e) {
                fit(tabs);
            }

            @Override
            public void componentRemoved(ContainerEvent e) {
                fit(tabs);
            }
        });
        tabs.addPropertyChangeListener("indexForTitle", e -> fit(tabs));
        fit(tabs);
    }

    /** Sets the cap for the pane's current width and titles (none when everything fits). */
    static void fit(JTabbedPane tabs) {
        int n = tabs.getTabCount();
        if (n == 0 || tabs.getWidth() == 0) {
            return;
        }
        Insets pane = tabs.getInsets();
        Insets area = UIManager.getInsets("TabbedPane.tabAreaInsets");
        int available = tabs.getWidth() - pane.left - pane.right - SLACK
                - (area == null ? 0 : area.left + area.right);
        int[] wanted = new int[n];
        for (int i = 0; i < n; i++) {
            wanted[i] = wantedWidth(tabs, i);
        }
        Integer cap = cap(wanted, available);
        Object old = tabs.getClientProperty(MAXIMUM_TAB_WIDTH);
        if (!java.util.Objects.equals(old, cap)) {
            tabs.putClientProperty(MAXIMUM_TAB_WIDTH, cap);
            tabs.revalidate();
            tabs.repaint();
        }
    }

    /**
     * The largest common cap under which the tabs fit in {@code available}, or null when they fit uncapped. Tabs
     * narrower than the cap keep their width, so the cap is found by filling the room up from the narrowest tab.
     */
    static Integer cap(int[] wanted, int available) {
        int total = 0;
        for (int w : wanted) {
            total += w;
        }
        if (total <= available) {
            return null;
        }
        int[] sorted = wanted.clone();
        java.util.Arrays.sort(sorted);
        int left = available;
        for (int i = 0; i < sorted.length; i++) {
            int share = left / (sorted.length - i);
            if (sorted[i] > share) {
                return Math.max(SMALLEST_CAP, share);
            }
            left -= sorted[i];
        }
        return null;
    }

    /** The width the look and feel gives tab {@code i} uncapped: title, icon and the tab's insets. */
    private static int wantedWidth(JTabbedPane tabs, int i) {
        FontMetrics fm = tabs.getFontMetrics(tabs.getFont());
        Component custom = tabs.getTabComponentAt(i);
        int content = custom != null ? custom.getPreferredSize().width : fm.stringWidth(tabs.getTitleAt(i));
        Icon icon = tabs.getIconAt(i);
        if (icon != null) {
            content += icon.getIconWidth() + UIManager.getInt("TabbedPane.textIconGap");
        }
        Insets in = tabs.getClientProperty(TAB_INSETS) instanceof Insets own ? own
                : UIManager.getInsets("TabbedPane.tabInsets");
        return content + (in == null ? 24 : in.left + in.right) + 2;
    }
}
