package org.ladderkin.gui.view;

import java.util.List;
import java.util.Locale;
import javax.swing.JTable;
import org.ladderkin.plan.ExpectedError;

/**
 * The design's expected errors per goal parameter: statistical, systematic and total, the dominant source and what to
 * measure better (also the tooltip); the same numbers as the report's budget table.
 */
final class ErrorBudgetTable extends JTable {

    private final RowTableModel<ExpectedError> model;

    ErrorBudgetTable() {
        this(new RowTableModel<>(List.of("Parameter", "Statistical", "Systematic", "Total", "Dominant source", "What to measure better"),
                ErrorBudgetTable::cell));
    }

    private ErrorBudgetTable(RowTableModel<ExpectedError> model) {
        super(model);
        this.model = model;
        setName("errorBudget");
        setFillsViewportHeight(true);
        getColumnModel().getColumn(0).setPreferredWidth(170);
        for (int c = 1; c <= 3; c++) {
            getColumnModel().getColumn(c).setPreferredWidth(80);
            getColumnModel().getColumn(c).setMinWidth(70);
        }
        getColumnModel().getColumn(4).setPreferredWidth(150);
        getColumnModel().getColumn(5).setPreferredWidth(480);
    }

    void show(List<ExpectedError> errors) {
        model.rows(errors);
    }

    List<ExpectedError> errors() {
        return model.rows();
    }

    @Override
    public String getToolTipText(java.awt.event.MouseEvent e) {
        int row = rowAtPoint(e.getPoint());
        return row < 0 ? null : model.rows().get(row).advice();
    }

    private static Object cell(ExpectedError e, int column) {
        return switch (column) {
            case 0 -> e.parameter().label();
            case 1 -> pct(e.statisticalRel());
            case 2 -> pct(e.systematicRel());
            case 3 -> pct(e.totalRel());
            case 4 -> e.dominant();
            default -> e.advice();
        };
    }

    static String pct(double rel) {
        return String.format(Locale.ROOT, "± %.2g %%", 100 * rel);
    }
}
