package org.ladderkin.fit.map;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;

class DeltaAMapTest {

    /** 4 wavelengths × 5 delays, value = 10·t + w, one missing cell. */
    private static DeltaAMap map() {
        double[] lambda = {500e-9, 510e-9, 520e-9, 530e-9};
        double[] delays = {-1e-12, -0.1e-12, 0, 0.2e-12, 5e-12};
        double[] v = new double[20];
        for (int t = 0; t < 5; t++) {
            for (int w = 0; w < 4; w++) {
                v[t * 4 + w] = 10 * t + w;
            }
        }
        v[3 * 4 + 2] = Double.NaN;
        return new DeltaAMap(lambda, delays, v);
    }

    @Test
    void windowsReturnNewMapsWithTheirCellsAndMask() {
        DeltaAMap m = map();
        DeltaAMap w = m.wavelengthWindow(505e-9, 520e-9);
        assertThat(w.wavelengthsM()).containsExactly(510e-9, 520e-9);
        assertThat(w.delayCount()).isEqualTo(5);
        assertThat(w.value(4, 0)).isEqualTo(41);
        assertThat(w.missing(3, 1)).isTrue();
        assertThat(m.wavelengthCount()).isEqualTo(4);

        DeltaAMap d = m.delayWindow(-0.1e-12, 1e-12);
        assertThat(d.delaysS()).containsExactly(-0.1e-12, 0, 0.2e-12);
        assertThat(d.value(0, 3)).isEqualTo(13);

        DeltaAMap z = m.excludingAroundTimeZero(0.15e-12);
        assertThat(z.delaysS()).containsExactly(-1e-12, 0.2e-12, 5e-12);
        assertThat(z.value(1, 1)).isEqualTo(31);
        assertThat(z.missingCount()).isEqualTo(1);
    }

    @Test
    void emptyWindowsAndBadGridsAreRefused() {
        assertThatThrownBy(() -> map().wavelengthWindow(600e-9, 700e-9)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> map().excludingAroundTimeZero(1)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new DeltaAMap(new double[] {2, 1}, new double[] {0}, new double[2]))
                .isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new DeltaAMap(new double[] {1}, new double[] {0, 0}, new double[2]))
                .isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new DeltaAMap(new double[] {1}, new double[] {0}, new double[2]))
                .isInstanceOf(IllegalArgumentException.class);
    }
}
