package org.ladderkin.gui.view;

import java.awt.Component;
import java.awt.Font;
import java.util.List;
import java.util.Locale;
import javax.swing.JLabel;
import javax.swing.JTable;
import javax.swing.UIManager;
import javax.swing.table.AbstractTableModel;
import javax.swing.table.DefaultTableCellRenderer;
import org.ladderkin.observe.Risk;
import org.ladderkin.observe.Verdict;

/** The risk list: one row per risk with its verdict, number, limit and what to do; the reason is also the tooltip. */
final class RiskTable extends JTable {

    private final Model model;

    RiskTable() {
        this(new Model());
    }

    private RiskTable(Model model) {
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
        model.rows = List.copyOf(risks);
        model.fireTableDataChanged();
    }

    List<Risk> risks() {
        return model.rows;
    }

    @Override
    public String getToolTipText(java.awt.event.MouseEvent e) {
        int row = rowAtPoint(e.getPoint());
        return row < 0 ? null : model.rows.get(row).why();
    }

    private static final class Model extends AbstractTableModel {
        private static final String[] COLUMNS = {"Verdict", "Risk", "Predicted", "Limit", "What it means"};
        private List<Risk> rows = List.of();

        @Override
        public int getRowCount() {
            return rows.size();
        }

        @Override
        public int getColumnCount() {
            return COLUMNS.length;
        }

        @Override
        public String getColumnName(int column) {
            return COLUMNS[column];
        }

        @Override
        public Object getValueAt(int row, int column) {
            Risk r = rows.get(row);
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
