package org.ladderkin.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import org.ladderkin.archive.DataFileHash;
import org.ladderkin.archive.FitEntry;
import org.ladderkin.archive.FitParameter;
import org.ladderkin.archive.PlanEntry;
import org.ladderkin.archive.SampleEntry;
import org.ladderkin.io.InputException;
import org.ladderkin.io.InputProblem;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.io.ResolvedJson;
import org.ladderkin.io.SourceLocation;
import org.ladderkin.material.Material;
import org.ladderkin.units.PhysicalConstants;

/**
 * What {@code archive add} reads from an output folder: a plan ({@code plan-resolved.json}) or a fit
 * ({@code fit-result.json} with the {@code fit-provenance.json} the fit wrote beside it: the sample and each data
 * file's SHA-256 at fit time). A data file whose digest changed since the fit is reported and the row kept with a
 * warning.
 */
final class ArchiveInputs {

    static final String PLAN_FILE = "plan-resolved.json";
    static final String FIT_FILE = "fit-result.json";
    static final String PROVENANCE_FILE = "fit-provenance.json";
    static final String PROVENANCE_SCHEMA = "ladderkin.fit-provenance/1";

    private static final ObjectMapper JSON = new ObjectMapper();

    private ArchiveInputs() {
    }

    /** What one folder adds. */
    sealed interface Addition permits PlanAddition, FitAddition { }

    record PlanAddition(SampleEntry sample, PlanEntry plan) implements Addition { }

    record FitAddition(SampleEntry sample, FitEntry fit) implements Addition { }

    /** The addition in {@code dir}; {@code givenSample} (from the command line) overrides the folder's own. */
    static Addition read(Path dir, SampleEntry givenSample) {
        Path abs = dir.toAbsolutePath().normalize();
        if (!Files.isDirectory(abs)) {
            throw new InputException(SourceLocation.of(dir.toString()), null, InputProblem.NOT_FOUND,
                    "not a folder (give a plan or fit output folder)");
        }
        if (Files.isRegularFile(abs.resolve(PLAN_FILE))) {
            return plan(abs, givenSample);
        }
        if (Files.isRegularFile(abs.resolve(FIT_FILE))) {
            return fit(abs, givenSample);
        }
        throw new InputException(SourceLocation.of(dir.toString()), null, InputProblem.NOT_FOUND,
                "holds neither a plan output (" + PLAN_FILE + ") nor a fit output (" + FIT_FILE + ")");
    }

    private static PlanAddition plan(Path dir, SampleEntry givenSample) {
        Path file = dir.resolve(PLAN_FILE);
        String text = text(file);
        JsonNode root = tree(file, text);
        requireSchema(file, root, "ladderkin.plan-resolved/");
        SampleEntry sample = givenSample;
        if (sample == null) {
            JsonNode s = root.path("sample");
            String material = s.path("material").asText("");
            double sizeM = s.path("sizeNm").asDouble(Double.NaN) * 1e-9;
            double volume = Double.NaN;
            if (!material.isEmpty() && sizeM > 0) {
                Material m = MaterialLibrary.fromHome().material(material);
                volume = m.volumeM3(sizeM);
            }
            sample = SampleEntry.of(s.path("name").asText(""), material, sizeM, volume,
                    s.path("firstExcitonEv").asDouble(Double.NaN) * PhysicalConstants.ELECTRONVOLT_J);
        }
        return new PlanAddition(sample, new PlanEntry(text, root.path("title").asText(""), dir.toString(),
                VersionProvider.version()));
    }

    private static FitAddition fit(Path dir, SampleEntry givenSample) {
        Path file = dir.resolve(FIT_FILE);
        String text = text(file);
        JsonNode root = tree(file, text);
        requireSchema(file, root, "ladderkin.fit-result/");
        Path provenanceFile = dir.resolve(PROVENANCE_FILE);
        JsonNode provenance = Files.isRegularFile(provenanceFile) ? tree(provenanceFile, text(provenanceFile)) : null;
        SampleEntry sample = givenSample != null ? givenSample : provenance == null ? null : sample(provenance.path("sample"));
        if (sample == null) {
            throw new InputException(SourceLocation.of(dir.toString()), null, InputProblem.MISSING_VALUE,
                    "the fit names no sample (give --sample FILE or --sample-name, --material and --diameter or --first-peak)");
        }
        List<String> warnings = new ArrayList<>();
        List<DataFileHash> files = new ArrayList<>();
        if (provenance != null) {
            for (JsonNode f : provenance.path("dataFiles")) {
                String path = f.path("path").asText();
                String then = f.path("sha256").asText("");
                String now = sha256OrEmpty(Path.of(path));
                if (now.isEmpty()) {
                    warnings.add("data file " + path + " is gone since the fit");
                } else if (!now.equals(then)) {
                    warnings.add("data file " + path + " changed since the fit (SHA-256 " + abbreviate(then) + " then, "
                            + abbreviate(now) + " now)");
                }
                files.add(new DataFileHash(path, then));
            }
        } else {
            for (JsonNode f : root.path("dataFiles")) {
                Path p = Path.of(f.asText()).toAbsolutePath().normalize();
                String now = sha256OrEmpty(p);
                warnings.add("data file " + p + (now.isEmpty() ? " not found" : " hashed when archived, not at fit time"));
                files.add(new DataFileHash(p.toString(), now));
            }
        }
        List<FitParameter> params = new ArrayList<>();
        List<String> free = new ArrayList<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = root.path("parameters").fields(); it.hasNext();) {
            Map.Entry<String, JsonNode> e = it.next();
            JsonNode p = e.getValue();
            boolean fixed = p.path("fixed").asBoolean(false);
            params.add(new FitParameter(e.getKey(), p.path("value").asDouble(Double.NaN), number(p.path("stdError")),
                    number(p.path("totalStdError")), fixed));
            if (!fixed) {
                free.add(e.getKey());
            }
        }
        String model = provenance != null && provenance.hasNonNull("model") ? provenance.path("model").asText()
                : "ladder; free: " + String.join(", ", free);
        String version = provenance != null ? provenance.path("toolVersion").asText(VersionProvider.version()) : VersionProvider.version();
        FitEntry fit = new FitEntry(text, root.path("status").asText(""), model, number(root.path("statistics").path("chiSquare")),
                params, files, dir.toString(), version, String.join("; ", warnings));
        return new FitAddition(sample, fit);
    }

    /**
     * Writes {@code fit-provenance.json} into a fit's output folder: the sample (if known), the model, and each data
     * file's absolute path and SHA-256 now, at fit time.
     */
    static void writeProvenance(Path outDir, List<Path> dataFiles, SampleEntry sample, String model) throws IOException {
        ObjectNode root = ResolvedJson.object();
        root.put("schema", PROVENANCE_SCHEMA);
        root.put("toolVersion", VersionProvider.version());
        root.put("model", model);
        if (sample != null) {
            ObjectNode s = root.putObject("sample");
            s.put("name", sample.name());
            s.put("material", sample.material());
            putNumber(s, "sizeNm", sample.sizeM() * 1e9);
            putNumber(s, "volumeNm3", sample.volumeM3() * 1e27);
            putNumber(s, "firstExcitonEv", sample.firstExcitonJ() / PhysicalConstants.ELECTRONVOLT_J);
            putNumber(s, "sizeDispersion", sample.sizeDispersion());
        }
        ArrayNode files = root.putArray("dataFiles");
        for (Path f : dataFiles) {
            Path abs = f.toAbsolutePath().normalize();
            ObjectNode o = files.addObject();
            o.put("path", abs.toString());
            o.put("sha256", sha256OrEmpty(abs));
        }
        ResolvedJson.write(outDir.resolve(PROVENANCE_FILE), root);
    }

    private static SampleEntry sample(JsonNode s) {
        if (s.isMissingNode() || s.isNull()) {
            return null;
        }
        return new SampleEntry(s.path("name").asText(""), s.path("material").asText(""), number(s.path("sizeNm")) * 1e-9,
                number(s.path("volumeNm3")) * 1e-27, number(s.path("firstExcitonEv")) * PhysicalConstants.ELECTRONVOLT_J,
                number(s.path("sizeDispersion")), "", "", "", "");
    }

    /** SHA-256 of a file as lower-case hex, or "" when it cannot be read. */
    static String sha256OrEmpty(Path file) {
        if (!Files.isRegularFile(file)) {
            return "";
        }
        try (InputStream in = Files.newInputStream(file)) {
            MessageDigest d = MessageDigest.getInstance("SHA-256");
            byte[] buf = new byte[1 << 16];
            for (int n = in.read(buf); n >= 0; n = in.read(buf)) {
                d.update(buf, 0, n);
            }
            return HexFormat.of().formatHex(d.digest());
        } catch (IOException e) {
            return "";
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java has SHA-256", e);
        }
    }

    private static String abbreviate(String sha) {
        return sha.isEmpty() ? "unknown" : sha.substring(0, 12) + "…";
    }

    private static double number(JsonNode n) {
        return n.isNumber() ? n.asDouble() : Double.NaN;
    }

    private static void putNumber(ObjectNode o, String key, double v) {
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }

    private static String text(Path file) {
        try {
            return Files.readString(file);
        } catch (IOException e) {
            throw new InputException(SourceLocation.of(file.toString()), null, InputProblem.UNREADABLE,
                    "cannot be read (" + e.getMessage() + ")");
        }
    }

    private static JsonNode tree(Path file, String text) {
        try {
            return JSON.readTree(text);
        } catch (IOException e) {
            throw new InputException(SourceLocation.of(file.toString()), null, InputProblem.BAD_SYNTAX,
                    "not valid JSON (" + String.valueOf(e.getMessage()).lines().findFirst().orElse("") + ")");
        }
    }

    private static void requireSchema(Path file, JsonNode root, String prefix) {
        String schema = root.path("schema").asText("");
        if (!schema.startsWith(prefix)) {
            throw new InputException(SourceLocation.of(file.toString()), "schema", InputProblem.WRONG_SCHEMA,
                    "is '" + schema + "' (expected " + prefix + "1)");
        }
    }
}
