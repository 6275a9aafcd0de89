package org.ladderkin.gui.view;

import java.util.List;
import java.util.Objects;
import java.util.function.BiFunction;
import javax.swing.table.AbstractTableModel;

/** A read-only table of rows of one type: named columns and a function that gives each cell. */
final class RowTableModel<R> extends AbstractTableModel {

    private final List<String> columns;
    private final BiFunction<R, Integer, Object> cell;
    private List<R> rows = List.of();

    /** @param cell the value of a row in a column (0-based) */
    RowTableModel(List<String> columns, BiFunction<R, Integer, Object> cell) {
        this.columns = List.copyOf(columns);
        this.cell = Objects.requireNonNull(cell, "cell");
    }

    /** Shows {@code next} in place of the current rows. */
    void rows(List<R> next) {
        rows = List.copyOf(next);
        fireTableDataChanged();
    }

    List<R> rows() {
        return rows;
    }

    @Override
    public int getRowCount() {
        return rows.size();
    }

    @Override
    public int getColumnCount() {
        return columns.size();
    }

    @Override
    public String getColumnName(int column) {
        return columns.get(column);
    }

    @Override
    public Object getValueAt(int row, int column) {
        return cell.apply(rows.get(row), column);
    }
}
