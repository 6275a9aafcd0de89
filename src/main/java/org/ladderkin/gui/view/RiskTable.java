package org.ladderkin.gui.view;

import java.awt.Component;
import java.awt.Font;
import java.util.List;
import java.util.Locale;
import javax.swing.JLabel;
import javax.swing.JTable;
import javax.swing.UIManager;
import javax.swing.table.DefaultTableCellRenderer;
import javax.swing.table.TableColumn;
import org.ladderkin.observe.Risk;
import org.ladderkin.observe.Verdict;

/**
 * The risk list: one row per risk with its verdict, number, limit and what to do; the reason is also the tooltip. The
 * verdict and the two numbers keep the width of their widest cell however narrow the window gets; the name and the
 * explanation share what is left (the explanation is cut first, its full text stays in the tooltip).
 */
final class RiskTable extends JTable {

    static final int VERDICT = 0;
    static final int NAME = 1;
    static final int PREDICTED = 2;
    static final int LIMIT = 3;
    static final int WHY = 4;
    /** Room around a cell's text: the renderer's border and the grid. */
    private static final int CELL_PADDING = 14;

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
        getColumnModel().getColumn(VERDICT).setCellRenderer(new VerdictRenderer());
        DefaultTableCellRenderer right = new DefaultTableCellRenderer();
        right.setHorizontalAlignment(JLabel.RIGHT);
        getColumnModel().getColumn(PREDICTED).setCellRenderer(right);
        getColumnModel().getColumn(LIMIT).setCellRenderer(right);
        getColumnModel().getColumn(NAME).setPreferredWidth(240);
        getColumnModel().getColumn(NAME).setMinWidth(110);
        getColumnModel().getColumn(WHY).setPreferredWidth(520);
        getColumnModel().getColumn(WHY).setMinWidth(40);
        fitFixedColumns();
    }

    void show(List<Risk> risks) {
        model.rows(risks);
        fitFixedColumns();
    }

    List<Risk> risks() {
        return model.rows();
    }

    @Override
    public void updateUI() {
        super.updateUI();
        if (model != null) {
            // a theme switch changes the font, so the widths are measured again
            fitFixedColumns();
        }
    }

    @Override
    public String getToolTipText(java.awt.event.MouseEvent e) {
        int row = rowAtPoint(e.getPoint());
        return row < 0 ? null : model.rows().get(row).why();
    }

    /** The widest cell of {@code column} (header included), as drawn: what the column must not go below. */
    int widestCell(int column) {
        TableColumn c = getColumnModel().getColumn(column);
        var header = getTableHeader() == null ? null : getTableHeader().getDefaultRenderer();
        int widest = header == null ? 0 : header.getTableCellRendererComponent(this, c.getHeaderValue(), false, false, -1,
                column).getPreferredSize().width;
        for (int r = 0; r < getRowCount(); r++) {
            Component cell = prepareRenderer(getCellRenderer(r, column), r, column);
            widest = Math.max(widest, cell.getPreferredSize().width);
        }
        return widest;
    }

    /** Verdict, predicted and limit: as wide as their widest cell, never narrower. */
    private void fitFixedColumns() {
        for (int column : new int[] {VERDICT, PREDICTED, LIMIT}) {
            int width = widestCell(column) + CELL_PADDING;
            TableColumn c = getColumnModel().getColumn(column);
            // the order matters: a column clamps its minimum to its maximum, and its width to both
            c.setMaxWidth(Integer.MAX_VALUE);
            c.setMinWidth(width);
            c.setPreferredWidth(width);
            c.setMaxWidth(column == VERDICT ? width : width * 2);
        }
    }

    private static Object cell(Risk r, int column) {
        return switch (column) {
            case VERDICT -> r.verdict();
            case NAME -> r.name();
            case PREDICTED -> number(r.value(), r.unit());
            case LIMIT -> number(r.limit(), r.unit());
            default -> r.why();
        };
    }

    /** Three significant digits without an exponent where one is not needed: "5391 K", "0.042 %", "2.1e-6 s". */
    static String number(double v, String unit) {
        if ("fraction".equals(unit)) {
            return compact(v * 100) + " %";
        }
        return (compact(v) + " " + (unit == null ? "" : unit)).strip();
    }

    static String compact(double v) {
        if (!Double.isFinite(v)) {
            return Double.isNaN(v) ? "—" : v > 0 ? "∞" : "−∞";
        }
        double a = Math.abs(v);
        if (a == 0) {
            return "0";
        }
        if (a >= 1e6 || a < 1e-3) {
            String s = String.format(Locale.ROOT, "%.2e", v);
            int e = s.indexOf('e');
            String mantissa = s.substring(0, e).replaceAll("0+$", "").replaceAll("\\.$", "");
            return mantissa + "e" + Integer.parseInt(s.substring(e + 1));
        }
        if (a >= 100) {
            return String.format(Locale.ROOT, "%.0f", v);
        }
        return new java.math.BigDecimal(v).round(new java.math.MathContext(3)).stripTrailingZeros().toPlainString();
    }

    private static final class VerdictRenderer extends DefaultTableCellRenderer {
        @Override
        public Component getTableCellRendererComponent(JTable table, Object value, boolean isSelected, boolean hasFocus,
                                                       int row, int column) {
            JLabel l = (JLabel) super.getTableCellRendererComponent(table, value, isSelected, hasFocus, row, column);
            if (value instanceof Verdict v) {
                l.setText(v.name().toLowerCase(Locale.ROOT));
                l.setFont(l.getFont().deriveFont(Font.BOLD));
                if (!isSelected) {
                    l.setForeground(UIManager.getColor("Ladderkin.verdict." + v.name().toLowerCase(Locale.ROOT)));
                }
            }
            return l;
        }
    }
}
