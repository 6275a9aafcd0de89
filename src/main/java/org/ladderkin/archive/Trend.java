package org.ladderkin.archive;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * A size (or energy) trend across the archive's samples: one point per sample from its newest current fit, a
 * power law per material ({@link PowerLawFit}, with intrinsic scatter), the Auger volume constant τ₂/V when the trend
 * is τ₂ against volume, and the library's published scaling as a reference line.
 *
 * @param x          x axis
 * @param y          y quantity
 * @param materials  one fitted trend per material, in the order first met
 * @param skipped    fits left out, each with why
 */
public record Trend(TrendAxis x, TrendQuantity y, List<MaterialTrend> materials, List<Skipped> skipped) {

    public Trend {
        Objects.requireNonNull(x, "x");
        Objects.requireNonNull(y, "y");
        materials = List.copyOf(materials);
        skipped = List.copyOf(skipped);
    }

    /**
     * A published scaling y = prefactor·x^exponent in the trend's units.
     *
     * @param prefactor  y at x = 1
     * @param exponent   power
     * @param source     where the library has it from
     */
    public record ReferenceLine(double prefactor, double exponent, String source) {
        public ReferenceLine {
            if (!(prefactor > 0) || !Double.isFinite(exponent)) {
                throw new IllegalArgumentException("a reference line needs a positive prefactor and a finite exponent");
            }
            Objects.requireNonNull(source, "source");
        }
    }

    /**
     * One material's points and line.
     *
     * @param material                 material key
     * @param points                   its samples
     * @param fit                      the power law with scatter, or null with fewer than {@link PowerLawFit#MIN_POINTS} points
     * @param augerVolumeConstant      τ₂/V (ps/nm³) with the exponent held at 1, or null unless the trend is τ₂ against volume
     * @param reference                the library's scaling, if it has one for this trend
     */
    public record MaterialTrend(String material, List<TrendPoint> points, PowerLawFit.Result fit,
                                PowerLawFit.Result augerVolumeConstant, Optional<ReferenceLine> reference) {
        public MaterialTrend {
            Objects.requireNonNull(material, "material");
            points = List.copyOf(points);
            Objects.requireNonNull(reference, "reference");
        }
    }

    /** A fit left out of the trend, and why. */
    public record Skipped(String sample, long fitId, String reason) {
        public Skipped {
            Objects.requireNonNull(sample, "sample");
            Objects.requireNonNull(reason, "reason");
        }
    }

    /**
     * The trend of {@code y} against {@code x} over {@code fits} (superseded ones already left out by the query);
     * {@code references} gives a material's published scaling, if any.
     */
    public static Trend of(List<ArchivedFit> fits, TrendAxis x, TrendQuantity y,
                           java.util.function.Function<String, Optional<ReferenceLine>> references) {
        Map<String, ArchivedFit> newest = new LinkedHashMap<>();
        List<Skipped> skipped = new ArrayList<>();
        for (ArchivedFit f : fits) {
            ArchivedFit before = newest.put(f.sample().name(), f);
            if (before != null) {
                skipped.add(new Skipped(before.sample().name(), before.id(), "a newer fit of the same sample (fit "
                        + f.id() + ") is used"));
            }
        }
        Map<String, List<TrendPoint>> byMaterial = new LinkedHashMap<>();
        for (ArchivedFit f : newest.values()) {
            String why = null;
            Optional<FitParameter> p = f.parameter(y.parameterKey());
            double xv = x.of(f.sample());
            if (p.isEmpty()) {
                why = "the fit has no " + y.parameterKey();
            } else if (p.get().fixed()) {
                why = y.parameterKey() + " was held, not fitted";
            } else if (!(p.get().bestStdError() > 0)) {
                why = "the fit gives no standard error for " + y.parameterKey();
            } else if (!(p.get().value() > 0)) {
                why = y.parameterKey() + " is not positive";
            } else if (!(xv > 0)) {
                why = "the sample does not give its " + x.key();
            }
            if (why != null) {
                skipped.add(new Skipped(f.sample().name(), f.id(), why));
                continue;
            }
            String report = f.fit().sourceDir().isEmpty() ? "" : f.fit().sourceDir() + "/fit-report.html";
            byMaterial.computeIfAbsent(f.sample().material(), k -> new ArrayList<>()).add(new TrendPoint(f.sample().name(),
                    f.sample().material(), xv, p.get().value(), p.get().bestStdError(), f.id(), report));
        }
        List<MaterialTrend> out = new ArrayList<>();
        for (Map.Entry<String, List<TrendPoint>> e : byMaterial.entrySet()) {
            List<TrendPoint> pts = e.getValue();
            double[] xs = pts.stream().mapToDouble(TrendPoint::x).toArray();
            double[] ys = pts.stream().mapToDouble(TrendPoint::y).toArray();
            double[] es = pts.stream().mapToDouble(TrendPoint::yStdError).toArray();
            PowerLawFit.Result fit = pts.size() >= PowerLawFit.MIN_POINTS ? PowerLawFit.fit(xs, ys, es, true) : null;
            PowerLawFit.Result auger = x == TrendAxis.VOLUME && y == TrendQuantity.TAU_AUGER2 && pts.size() >= 2
                    ? PowerLawFit.fitHeldExponent(xs, ys, es, true, 1.0) : null;
            out.add(new MaterialTrend(e.getKey(), pts, fit, auger, references.apply(e.getKey())));
        }
        return new Trend(x, y, out, skipped);
    }
}
