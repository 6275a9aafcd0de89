package org.ladderkin.units;

import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class PhotonTest {

    @Test
    @CheckedAgainst(source = "SI Brochure, 9th ed. (BIPM 2019), Table 1 (defining constants h, c, e, exact); CODATA 2018 "
            + "(Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021)) hc = 1239.841984 eV·nm",
            kind = CheckedAgainst.Kind.PUBLISHED)
    void photonEnergyOf400nmIs3Point0996eV() {
        Reference.check("photon energy of 400 nm (eV)", Photon.energyEv(400e-9), 1239.841984 / 400, 2e-9);
        Reference.check("photon energy of 400 nm to 4 decimals (eV)", Photon.energyEv(400e-9), 3.0996, 5e-5);
        Reference.check("hc (eV·nm)", PhysicalConstants.HC_J_M / PhysicalConstants.ELECTRONVOLT_J * 1e9, 1239.841984, 5e-7);
    }

    @Test
    void wavelengthAndEnergyAreInverse() {
        double e = Photon.energyJ(515e-9);
        org.assertj.core.api.Assertions.assertThat(Photon.wavelengthM(e)).isCloseTo(515e-9, org.assertj.core.data.Offset.offset(1e-21));
    }

    @Test
    void rejectsNonPositiveWavelength() {
        assertThatThrownBy(() -> Photon.energyJ(-400e-9)).hasMessageContaining("wavelength must be > 0");
        assertThatThrownBy(() -> Photon.energyJ(Double.NaN)).hasMessageContaining("wavelength must be > 0");
    }
}
