package org.ladderkin.gui.view;

import java.awt.Component;
import java.awt.Font;
import java.util.List;
import java.util.Locale;
import javax.swing.JLabel;
import javax.swing.JTable;
import javax.swing.UIManager;
import javax.swing.table.DefaultTableCellRenderer;
import org.ladderkin.observe.Risk;
import org.ladderkin.observe.Verdict;

/** The risk list: one row per risk with its verdict, number, limit and what to do; the reason is also the tooltip. */
final class RiskTable extends JTable {

    private final RowTableModel<Risk> model;

    RiskTable() {
        this(new RowTableModel<>(List.of("Verdict", "Risk", "Predicted", "Limit", "What it means"), RiskTable::cell));
    }

    private RiskTable(RowTableModel<Risk> model) {
        super(model);
        this.model = model;
        setName("risks");
        setAutoCreateRowSorter(false);
        setFillsViewportHeight(true);
        getColumnModel().getColumn(0).setCellRenderer(new VerdictRenderer());
        getColumnModel().getColumn(0).setMaxWidth(70);
        getColumnModel().getColumn(1).setPreferredWidth(260);
        getColumnModel().getColumn(2).setPreferredWidth(90);
        getColumnModel().getColumn(3).setPreferredWidth(90);
        getColumnModel().getColumn(4).setPreferredWidth(520);
    }

    void show(List<Risk> risks) {
        model.rows(risks);
    }

    List<Risk> risks() {
        return model.rows();
    }

    @Override
    public String getToolTipText(java.awt.event.MouseEvent e) {
        int row = rowAtPoint(e.getPoint());
        return row < 0 ? null : model.rows().get(row).why();
    }

    private static Object cell(Risk r, int column) {
        return switch (column) {
            case 0 -> r.verdict();
            case 1 -> r.name();
            case 2 -> number(r.value(), r.unit());
            case 3 -> number(r.limit(), r.unit());
            default -> r.why();
        };
    }

    private static String number(double v, String unit) {
        if ("fraction".equals(unit)) {
            return String.format(Locale.ROOT, "%.3g %%", v * 100);
        }
        return String.format(Locale.ROOT, "%.3g %s", v, unit).strip();
    }

    private static final class VerdictRenderer extends DefaultTableCellRenderer {
        @Override
        public Component getTableCellRendererComponent(JTable table, Object value, boolean isSelected, boolean hasFocus,
                                                       int row, int column) {
            JLabel l = (JLabel) super.getTableCellRendererComponent(table, value, isSelected, hasFocus, row, column);
            Verdict v = (Verdict) value;
            l.setText(v.name().toLowerCase(Locale.ROOT));
            l.setFont(l.getFont().deriveFont(Font.BOLD));
            if (!isSelected) {
                l.setForeground(UIManager.getColor("Ladderkin.verdict." + v.name().toLowerCase(Locale.ROOT)));
            }
            return l;
        }
    }
}
