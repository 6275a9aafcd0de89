package org.ladderkin.archive;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * What every archive database must do, run once on a SQLite file and once on a PostgreSQL server: the same rows come
 * back, nothing is overwritten, and a newer schema is refused.
 */
abstract class ArchiveStoreContract {

    /** A fresh, empty archive's JDBC URL. */
    abstract String freshUrl() throws Exception;

    static SampleEntry cdse(String name, double diameterNm) {
        double d = diameterNm * 1e-9;
        return new SampleEntry(name, "CdSe", d, Math.PI * d * d * d / 6, 2.1 * 1.602176634e-19, 0.06, "", "FH-B7",
                "2026-11-30", "invented batch");
    }

    static FitEntry fit(double tauPs, double errPs) {
        return new FitEntry("{\"schema\":\"ladderkin.fit-result/1\"}", "converged", "ladder", 812.5,
                List.of(new FitParameter("tauAuger2Ps", tauPs, errPs, Double.NaN, false),
                        new FitParameter("crossSectionCm2", 3e-15, 2e-16, 4e-16, false),
                        new FitParameter("tauRadNs", 20, Double.NaN, Double.NaN, true)),
                List.of(new DataFileHash("/data/a.csv", "0".repeat(64))), "/out/fit", "0.1-test", "");
    }

    @Test
    void rowsComeBackAsWrittenAndARefitIsANewRow() throws Exception {
        String url = freshUrl();
        try (ArchiveStore a = ArchiveStore.open(url, "test archive")) {
            assertThat(a.schemaVersion()).isEqualTo(Schema.CURRENT);
            long first = a.addFit(cdse("FH-CdSe-A", 3.1), fit(25.0, 1.5));
            long second = a.addFit(cdse("FH-CdSe-A", 3.1), fit(27.0, 1.2));
            a.addPlan(cdse("FH-CdSe-B", 4.4), new PlanEntry("{\"schema\":\"ladderkin.plan-resolved/1\"}", "a plan", "/p", "0.1"));
            assertThat(second).isNotEqualTo(first);
            a.markSuperseded(first);

            ArchivedFit f = a.fit(first);
            assertThat(f.superseded()).isTrue();
            assertThat(f.sample().name()).isEqualTo("FH-CdSe-A");
            assertThat(f.sample().sizeM()).isEqualTo(3.1 * 1e-9);
            assertThat(f.sample().batch()).isEqualTo("FH-B7");
            assertThat(f.parameter("tauAuger2Ps").orElseThrow().value()).isEqualTo(25.0);
            assertThat(f.parameter("tauRadNs").orElseThrow().stdError()).isNaN();
            assertThat(f.parameter("tauRadNs").orElseThrow().fixed()).isTrue();
            assertThat(f.parameter("crossSectionCm2").orElseThrow().bestStdError()).isEqualTo(4e-16);
            assertThat(f.fit().chiSquare()).isEqualTo(812.5);
            assertThat(f.fit().dataFiles()).containsExactly(new DataFileHash("/data/a.csv", "0".repeat(64)));

            assertThat(a.fits(FitQuery.all())).extracting(ArchivedFit::id).containsExactly(second);
            assertThat(a.fits(new FitQuery(List.of(), null, true))).hasSize(2);
            assertThat(a.fits(new FitQuery(List.of("PbSe"), null, true))).isEmpty();
            assertThat(a.samples(FitQuery.all())).extracting(s -> s.sample().name() + ":" + s.plans() + ":" + s.fits())
                    .containsExactly("FH-CdSe-A:0:2", "FH-CdSe-B:1:0");
            assertThat(a.plans(FitQuery.all())).singleElement().satisfies(p -> assertThat(p.plan().title()).isEqualTo("a plan"));
            assertThatThrownBy(() -> a.fit(9999)).isInstanceOf(ArchiveException.class)
                    .extracting(e -> ((ArchiveException) e).kind()).isEqualTo(ArchiveException.Kind.NOT_FOUND);
        }
        // reopened: the rows are there, the schema is not migrated twice
        try (ArchiveStore a = ArchiveStore.open(url, "test archive")) {
            assertThat(a.fits(new FitQuery(List.of(), null, true))).hasSize(2);
            assertThat(a.schemaVersion()).isEqualTo(Schema.CURRENT);
        }
    }

    @Test
    void aSampleNameCannotChangeItsMaterial() throws Exception {
        try (ArchiveStore a = ArchiveStore.open(freshUrl(), "test archive")) {
            a.addFit(cdse("FH-X", 3), fit(20, 1));
            SampleEntry pbse = new SampleEntry("FH-X", "PbSe", 5e-9, Double.NaN, Double.NaN, Double.NaN, "", "", "", "");
            assertThatThrownBy(() -> a.addFit(pbse, fit(20, 1))).isInstanceOf(ArchiveException.class)
                    .hasMessageContaining("sample 'FH-X' is CdSe in the archive, not PbSe");
            // the refused add left nothing behind
            assertThat(a.fits(FitQuery.all())).hasSize(1);
        }
    }

    @Test
    void aNewerSchemaIsRefusedWithAClearMessage() throws Exception {
        String url = freshUrl();
        try (ArchiveStore a = ArchiveStore.open(url, "shared archive")) {
            a.addFit(cdse("FH-N", 3), fit(20, 1));
        }
        try (Connection c = DriverManager.getConnection(url); Statement s = c.createStatement()) {
            s.execute("INSERT INTO " + Schema.VERSION_TABLE + " (version, applied_at) VALUES (" + (Schema.CURRENT + 1)
                    + ", 'a future ladderkin')");
        }
        assertThatThrownBy(() -> ArchiveStore.open(url, "shared archive")).isInstanceOf(ArchiveException.class)
                .hasMessage("shared archive: archive schema version " + (Schema.CURRENT + 1) + " is newer than this ladderkin "
                        + "reads (" + Schema.CURRENT + "); use a newer ladderkin")
                .extracting(e -> ((ArchiveException) e).kind()).isEqualTo(ArchiveException.Kind.NEWER_SCHEMA);
    }
}
