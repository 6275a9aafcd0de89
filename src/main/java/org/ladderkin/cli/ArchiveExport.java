package org.ladderkin.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import java.util.Locale;
import java.util.TreeSet;
import org.ladderkin.archive.ArchivedFit;
import org.ladderkin.archive.FitParameter;
import org.ladderkin.io.ResolvedJson;
import org.ladderkin.units.PhysicalConstants;

/** The archive's fits as a CSV table (one column group per parameter) or a JSON array, for spreadsheets and scripts. */
final class ArchiveExport {

    private ArchiveExport() {
    }

    static String csv(List<ArchivedFit> fits) {
        TreeSet<String> keys = new TreeSet<>();
        fits.forEach(f -> f.fit().parameters().forEach(p -> keys.add(p.key())));
        StringBuilder b = new StringBuilder("fitId,addedAt,sample,material,sizeNm,volumeNm3,firstExcitonEv,status,superseded");
        for (String k : keys) {
            b.append(',').append(k).append(',').append(k).append("StdError,").append(k).append("TotalStdError,").append(k).append("Fixed");
        }
        b.append(",warning\n");
        for (ArchivedFit f : fits) {
            b.append(f.id()).append(',').append(f.addedAt()).append(',').append(cell(f.sample().name())).append(',')
                    .append(cell(f.sample().material())).append(',').append(n(f.sample().sizeM() * 1e9)).append(',')
                    .append(n(f.sample().volumeM3() * 1e27)).append(',')
                    .append(n(f.sample().firstExcitonJ() / PhysicalConstants.ELECTRONVOLT_J)).append(',')
                    .append(cell(f.fit().status())).append(',').append(f.superseded());
            for (String k : keys) {
                FitParameter p = f.parameter(k).orElse(null);
                b.append(',').append(p == null ? "" : n(p.value())).append(',').append(p == null ? "" : n(p.stdError()))
                        .append(',').append(p == null ? "" : n(p.totalStdError())).append(',').append(p == null ? "" : p.fixed());
            }
            b.append(',').append(cell(f.fit().warning())).append('\n');
        }
        return b.toString();
    }

    static ObjectNode json(List<ArchivedFit> fits) {
        ObjectNode root = ResolvedJson.object();
        root.put("schema", "ladderkin.archive-export/1");
        ArrayNode rows = root.putArray("fits");
        for (ArchivedFit f : fits) {
            ObjectNode o = rows.addObject();
            o.put("fitId", f.id());
            o.put("addedAt", f.addedAt());
            ObjectNode s = o.putObject("sample");
            s.put("name", f.sample().name());
            s.put("material", f.sample().material());
            put(s, "sizeNm", f.sample().sizeM() * 1e9);
            put(s, "volumeNm3", f.sample().volumeM3() * 1e27);
            put(s, "firstExcitonEv", f.sample().firstExcitonJ() / PhysicalConstants.ELECTRONVOLT_J);
            o.put("status", f.fit().status());
            o.put("superseded", f.superseded());
            put(o, "chiSquare", f.fit().chiSquare());
            ObjectNode ps = o.putObject("parameters");
            for (FitParameter p : f.fit().parameters()) {
                ObjectNode po = ps.putObject(p.key());
                po.put("value", p.value());
                put(po, "stdError", p.stdError());
                put(po, "totalStdError", p.totalStdError());
                po.put("fixed", p.fixed());
            }
            ArrayNode files = o.putArray("dataFiles");
            f.fit().dataFiles().forEach(d -> files.addObject().put("path", d.path()).put("sha256", d.sha256()));
            o.put("warning", f.fit().warning());
        }
        return root;
    }

    private static void put(ObjectNode o, String key, double v) {
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }

    private static String n(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.8g", v) : "";
    }

    private static String cell(String s) {
        return s.contains(",") || s.contains("\"") || s.contains("\n") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
    }
}
