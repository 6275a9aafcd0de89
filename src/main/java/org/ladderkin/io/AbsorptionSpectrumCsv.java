package org.ladderkin.io;

import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.sample.AbsorptionSpectrum;

/**
 * Reads a measured absorption spectrum: a CSV file whose first line that is not a {@code #} comment is the header
 * {@code wavelength_nm,absorbance}, then one {@code wavelength,absorbance} pair per line. Wavelengths may rise or fall
 * (spectrometers export both) but must not repeat. Problems are reported as {@code FILE:LINE: what is wrong}.
 */
public final class AbsorptionSpectrumCsv {

    /** The required header. */
    public static final String HEADER = "wavelength_nm,absorbance";

    private AbsorptionSpectrumCsv() {
    }

    /** Reads {@code file}; {@code displayName} names it in messages. */
    public static AbsorptionSpectrum read(Path file, String displayName) {
        List<String> lines;
        try {
            lines = List.of(StandardCharsets.UTF_8.newDecoder().decode(java.nio.ByteBuffer.wrap(Files.readAllBytes(file)))
                    .toString().split("\\R", -1));
        } catch (NoSuchFileException e) {
            throw new InputException(SourceLocation.of(displayName), null, InputProblem.NOT_FOUND, "file not found");
        } catch (CharacterCodingException e) {
            throw new InputException(SourceLocation.of(displayName), null, InputProblem.UNREADABLE, "not UTF-8 text (save the file as UTF-8)");
        } catch (IOException e) {
            throw new InputException(SourceLocation.of(displayName), null, InputProblem.UNREADABLE, "cannot read file: " + e.getMessage());
        }
        return parse(lines, displayName);
    }

    /** Parses the lines of a spectrum file. */
    public static AbsorptionSpectrum parse(List<String> lines, String displayName) {
        boolean headerSeen = false;
        List<double[]> points = new ArrayList<>();
        List<Integer> lineOf = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) {
            String raw = lines.get(i);
            String line = (i == 0 && raw.startsWith("\uFEFF") ? raw.substring(1) : raw).strip();
            int lineNo = i + 1;
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            if (!headerSeen) {
                if (!line.replace(" ", "").toLowerCase(Locale.ROOT).equals(HEADER)) {
                    throw at(displayName, lineNo, InputProblem.MISSING_FIELD, "expected the header '" + HEADER + "', found '" + line + "'");
                }
                headerSeen = true;
                continue;
            }
            String[] cells = line.split(",", -1);
            if (cells.length != 2) {
                throw at(displayName, lineNo, InputProblem.BAD_SYNTAX, "expected two values 'wavelength_nm,absorbance', found " + cells.length);
            }
            double w = number(cells[0], displayName, lineNo, "wavelength");
            double a = number(cells[1], displayName, lineNo, "absorbance");
            if (!(w > 0)) {
                throw at(displayName, lineNo, InputProblem.OUT_OF_RANGE, "wavelength must be > 0 nm, was " + cells[0].strip());
            }
            points.add(new double[] {w / 1e9, a});
            lineOf.add(lineNo);
        }
        if (!headerSeen) {
            throw at(displayName, Math.max(1, lines.size()), InputProblem.EMPTY, "no header '" + HEADER + "' found (empty file?)");
        }
        if (points.size() < 2) {
            throw at(displayName, Math.max(1, lines.size()), InputProblem.EMPTY, "needs at least two data lines, found " + points.size());
        }
        boolean falling = points.get(1)[0] < points.get(0)[0];
        for (int i = 1; i < points.size(); i++) {
            boolean ok = falling ? points.get(i)[0] < points.get(i - 1)[0] : points.get(i)[0] > points.get(i - 1)[0];
            if (!ok) {
                throw at(displayName, lineOf.get(i), InputProblem.BAD_ORDER, "wavelengths must keep " + (falling ? "falling" : "rising")
                        + " without repeats, but " + fmt(points.get(i)[0]) + " nm follows " + fmt(points.get(i - 1)[0]) + " nm");
            }
        }
        int n = points.size();
        double[] w = new double[n];
        double[] a = new double[n];
        for (int i = 0; i < n; i++) {
            double[] p = points.get(falling ? n - 1 - i : i);
            w[i] = p[0];
            a[i] = p[1];
        }
        return new AbsorptionSpectrum(w, a, displayName);
    }

    private static double number(String cell, String file, int line, String what) {
        String s = cell.strip();
        try {
            double v = Double.parseDouble(s);
            if (!Double.isFinite(v)) {
                throw at(file, line, InputProblem.OUT_OF_RANGE, what + " must be a finite number, was '" + s + "'");
            }
            return v;
        } catch (NumberFormatException e) {
            throw at(file, line, InputProblem.BAD_NUMBER, what + " is not a number: '" + s + "'");
        }
    }

    private static String fmt(double m) {
        return org.ladderkin.material.Numbers.sig(m * 1e9, 6);
    }

    private static InputException at(String file, int line, InputProblem key, String problem) {
        return new InputException(new SourceLocation(file, line, 0), null, key, problem);
    }
}
