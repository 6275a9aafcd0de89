package org.ladderkin.excite;

import java.util.Comparator;
import java.util.List;
import java.util.Objects;

/**
 * A relative uncertainty and where it comes from: independent contributions added in quadrature (GUM's law of
 * propagation for uncorrelated inputs, first order).
 *
 * @param items each contribution, in the order given
 */
public record RelativeBudget(List<Item> items) {

    /**
     * One source of uncertainty and its contribution to the quantity's relative standard uncertainty.
     *
     * @param source what it is, in words a lab uses ("pulse energy (power meter)")
     * @param rel    its contribution (relative, ≥ 0)
     */
    public record Item(String source, double rel) {
        public Item {
            Objects.requireNonNull(source, "source");
            if (!(rel >= 0) || !Double.isFinite(rel)) {
                throw new IllegalArgumentException("relative uncertainty of '" + source + "' must be finite and >= 0, was " + rel);
            }
        }
    }

    /** No contribution at all. */
    public static final RelativeBudget NONE = new RelativeBudget(List.of());

    public RelativeBudget {
        items = List.copyOf(items);
    }

    /** The total relative standard uncertainty, √Σ rel². */
    public double totalRel() {
        double s = 0;
        for (Item i : items) {
            s += i.rel() * i.rel();
        }
        return Math.sqrt(s);
    }

    /** The largest contribution, if any is non-zero. */
    public java.util.Optional<Item> dominant() {
        return items.stream().filter(i -> i.rel() > 0).max(Comparator.comparingDouble(Item::rel));
    }

    /** This budget with one more contribution. */
    public RelativeBudget plus(String source, double rel) {
        List<Item> next = new java.util.ArrayList<>(items);
        next.add(new Item(source, rel));
        return new RelativeBudget(next);
    }
}
