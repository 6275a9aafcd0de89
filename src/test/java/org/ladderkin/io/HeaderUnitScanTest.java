package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;

import java.time.Duration;
import java.util.Objects;
import java.util.SplittableRandom;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Unit;
import org.ladderkin.units.Units;

/**
 * The header scans replaced regular expressions that backtracked quadratically on long cells. The old patterns are
 * kept here as the oracle: on every short header drawn from the characters that matter, the scans must agree with them.
 */
class HeaderUnitScanTest {

    private static final Pattern BRACKETED = Pattern.compile("^(.*?)\\s*[(\\[]\\s*([^()\\[\\]]*?)\\s*[)\\]]\\s*$");
    private static final Pattern ANY_BRACKETED = Pattern.compile("[(\\[]\\s*([^()\\[\\]]*?)\\s*[)\\]]");
    private static final Pattern SUFFIXED = Pattern.compile("^(.*?)\\s*[/_]\\s*([^/_]+?)\\s*$");
    private static final Pattern SIGNAL_SUFFIX = Pattern.compile("^(.*?)[\\s/_]+([^\\s/_()\\[\\]]+)\\s*$");
    private static final String[] PIECES = {" ", "(", ")", "[", "]", "/", "_", "ps", "ns", "nm", "mOD", "OD", "t", "delay", "x", "µOD", "1 nJ"};
    private static final SourceLocation HERE = new SourceLocation("t.csv", 1, 1);

    @Test
    void scansAgreeWithTheRegularExpressionsTheyReplace() {
        SplittableRandom random = new SplittableRandom(20261203);
        for (int k = 0; k < 20_000; k++) {
            StringBuilder b = new StringBuilder();
            int pieces = 1 + random.nextInt(7);
            for (int i = 0; i < pieces; i++) {
                b.append(PIECES[random.nextInt(PIECES.length)]);
            }
            String header = b.toString();
            assertThat(outcome(() -> HeaderUnit.of(header, Dimension.TIME, null, HERE, "--delay-unit")))
                    .as("unit of '%s'", header).isEqualTo(oldOf(header));
            assertThat(HeaderUnit.name(header)).as("name of '%s'", header).isEqualTo(oldName(header));
            assertThat(HeaderUnit.position(header, Dimension.TIME)).as("position in '%s'", header).isEqualTo(oldPosition(header, Dimension.TIME));
            assertThat(HeaderUnit.find(header, Dimension.LENGTH)).as("find in '%s'", header).isEqualTo(oldFind(header, Dimension.LENGTH));
            assertThat(Objects.toString(HeaderUnit.signalToOd(header))).as("signal unit of '%s'", header)
                    .isEqualTo(Objects.toString(oldSignalToOd(header)));
            assertThat(HeaderUnit.signalName(header)).as("signal name of '%s'", header).isEqualTo(oldSignalName(header));
        }
    }

    /** A 60,000-character header cell used to hang the trace and IRF readers (issue found by fuzzing). */
    @Test
    void longHeadersAreRefusedOrReadAtOnce() {
        String spaces = " ".repeat(60_000);
        assertTimeoutPreemptively(Duration.ofSeconds(20), () -> {
            String outcome = outcome(() -> HeaderUnit.of("delay (" + spaces + "x" + spaces, Dimension.TIME, null, HERE, "--delay-unit"));
            assertThat(outcome).startsWith("OUT_OF_RANGE").contains("header too long (60008 characters, at most 500)");
            assertThat(outcome).doesNotContain(spaces.substring(0, 100)).hasSizeLessThan(300);
            assertThat(HeaderUnit.position("(" + spaces + "x" + spaces, Dimension.TIME)).isEqualTo(-1);
            assertThat(HeaderUnit.signalName("dA" + spaces + "mOD")).isEqualTo("dA");
        });
    }

    private static String outcome(java.util.concurrent.Callable<Unit> read) {
        try {
            return "unit " + read.call().symbol();
        } catch (InputException e) {
            return e.key() + " " + e.getMessage();
        } catch (Exception e) {
            throw new AssertionError(e);
        }
    }

    private static String oldOf(String header) {
        String h = header.strip();
        Matcher m = BRACKETED.matcher(h);
        if (m.matches()) {
            Unit u = Units.find(m.group(2));
            if (u == null || u.dimension() != Dimension.TIME) {
                return InputProblem.UNKNOWN_UNIT + " " + new InputException(HERE, h, InputProblem.UNKNOWN_UNIT, "unknown time unit '" + m.group(2)
                        + "' in header (units: " + Units.accepted(Dimension.TIME) + ")").getMessage();
            }
            return "unit " + u.symbol();
        }
        Matcher s = SUFFIXED.matcher(h);
        if (s.matches()) {
            Unit u = Units.find(s.group(2));
            if (u != null && u.dimension() == Dimension.TIME) {
                return "unit " + u.symbol();
            }
        }
        return InputProblem.WRONG_UNIT + " " + new InputException(HERE, h, InputProblem.WRONG_UNIT, "no time unit in header (write it like 'delay ("
                + Units.of(Dimension.TIME).get(1).symbol() + ")' or give --delay-unit)").getMessage();
    }

    private static String oldName(String header) {
        Matcher m = BRACKETED.matcher(header.strip());
        return m.matches() && !m.group(1).isBlank() ? m.group(1).strip() : header.strip();
    }

    private static int oldPosition(String text, Dimension dimension) {
        Matcher m = ANY_BRACKETED.matcher(text);
        while (m.find()) {
            Unit u = Units.find(m.group(1));
            if (u != null && u.dimension() == dimension) {
                return m.start();
            }
        }
        return -1;
    }

    private static Unit oldFind(String text, Dimension dimension) {
        Matcher m = ANY_BRACKETED.matcher(text);
        while (m.find()) {
            Unit u = Units.find(m.group(1));
            if (u != null && u.dimension() == dimension) {
                return u;
            }
        }
        return null;
    }

    private static final java.util.Map<String, Double> SIGNAL_UNITS = java.util.Map.of("OD", 1.0, "mOD", 1e-3,
            "\u00b5OD", 1e-6, "\u03bcOD", 1e-6, "uOD", 1e-6);

    private static String oldSignalUnit(String header) {
        String h = header.strip();
        Matcher m = BRACKETED.matcher(h);
        if (m.matches()) {
            return SIGNAL_UNITS.containsKey(m.group(2)) ? m.group(2) : null;
        }
        Matcher s = SIGNAL_SUFFIX.matcher(h);
        return s.matches() && SIGNAL_UNITS.containsKey(s.group(2)) ? s.group(2) : null;
    }

    private static Double oldSignalToOd(String header) {
        String u = oldSignalUnit(header);
        return u == null ? Double.NaN : SIGNAL_UNITS.get(u);
    }

    private static String oldSignalName(String header) {
        String h = header.strip();
        if (oldSignalUnit(h) == null) {
            return h;
        }
        Matcher m = BRACKETED.matcher(h);
        String name = m.matches() ? m.group(1) : SIGNAL_SUFFIX.matcher(h).replaceAll("$1");
        return name.isBlank() ? h : name.strip();
    }
}
