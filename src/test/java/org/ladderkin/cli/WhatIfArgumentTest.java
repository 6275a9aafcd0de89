package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.ladderkin.plan.WhatIfChange;
import org.ladderkin.sample.Refresh;

class WhatIfArgumentTest {

    @Test
    void changesAreReadWithTheirUnits() {
        assertThat(WhatIfArgument.parse("rate=80 MHz")).isEqualTo(new WhatIfChange.RepetitionRateChange(80e6));
        assertThat(WhatIfArgument.parse(" refresh = stirred")).isEqualTo(new WhatIfChange.RefreshChange(Refresh.stirred()));
        WhatIfChange.RefreshChange flowing = (WhatIfChange.RefreshChange) WhatIfArgument.parse("refresh=flowing:6 mL/min:0.5 mL");
        assertThat(flowing.refresh().mode()).isEqualTo(Refresh.Mode.FLOWING);
        assertThat(flowing.refresh().flowRateM3PerS()).isCloseTo(1e-7, org.assertj.core.data.Percentage.withPercentage(1e-9));
        assertThat(flowing.refresh().cellVolumeM3()).isCloseTo(0.5e-6, org.assertj.core.data.Percentage.withPercentage(1e-9));
    }

    @Test
    void malformedChangesSayWhatIsExpected() {
        assertThatThrownBy(() -> WhatIfArgument.parse("foo")).hasMessage("what-if 'foo' must look like refresh=static or rate=80 MHz");
        assertThatThrownBy(() -> WhatIfArgument.parse("refresh=flowing")).hasMessageContaining("needs flow rate and cell volume");
        assertThatThrownBy(() -> WhatIfArgument.parse("refresh=bogus"))
                .hasMessage("what-if refresh must be static, stirred or flowing, was 'bogus'");
        assertThatThrownBy(() -> WhatIfArgument.parse("bar=1")).hasMessageStartingWith("unknown what-if 'bar'");
        assertThatThrownBy(() -> WhatIfArgument.parse("rate=5 ps")).hasMessageContaining("expected a frequency");
    }
}
