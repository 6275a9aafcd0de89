package org.ladderkin.io;

import java.util.Arrays;

/**
 * A growable array of primitive doubles. Readers of large tables append here instead of to a {@code List<Double>},
 * which would box every value (about 24 bytes each instead of 8).
 */
final class GrowableDoubles {

    private double[] values;
    private int size;

    GrowableDoubles() {
        this(1024);
    }

    GrowableDoubles(int initialCapacity) {
        values = new double[Math.max(initialCapacity, 16)];
    }

    void add(double v) {
        if (size == values.length) {
            // 1.5x growth keeps the peak at ~2.5 copies of the data during a resize
            values = Arrays.copyOf(values, values.length + (values.length >> 1) + 1);
        }
        values[size++] = v;
    }

    double get(int i) {
        if (i < 0 || i >= size) {
            throw new IndexOutOfBoundsException("index " + i + " of " + size);
        }
        return values[i];
    }

    void set(int i, double v) {
        if (i < 0 || i >= size) {
            throw new IndexOutOfBoundsException("index " + i + " of " + size);
        }
        values[i] = v;
    }

    int size() {
        return size;
    }

    double last() {
        return values[size - 1];
    }

    /** A copy trimmed to the size. */
    double[] toArray() {
        return Arrays.copyOf(values, size);
    }
}
