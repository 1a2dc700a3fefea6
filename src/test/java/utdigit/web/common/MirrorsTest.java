package utdigit.web.common;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Optional;
import org.junit.jupiter.api.Test;
import utdigit.web.units.Mirrors;

/**
 * The inch mirrors of length results and the inch values beside the lengths a message quotes: 25.4 mm
 * per inch exactly (NIST SP 811, B.8), messages to 4 significant digits.
 */
class MirrorsTest {

    @Test
    void lengthResultsInInchesRoundTripAndKeepTheirThreeStates() {
        // 25.4 mm is one inch exactly; 1 mm is 1/25.4 in; back to mm within a unit of the last place.
        assertThat(Mirrors.inches(25.4)).isEqualTo(1.0);
        assertThat(Mirrors.inches(12.5) * 25.4).isCloseTo(12.5, within(Math.ulp(12.5)));
        assertThat(Mirrors.inches((Double) null)).isNull();
        assertThat(Mirrors.inches((Optional<Double>) null)).isNull();
        assertThat(Mirrors.inches(Optional.<Double>empty())).isEmpty();
        assertThat(Mirrors.inches(Optional.of(50.8))).contains(2.0);
    }

    @Test
    void aMessageQuotesTheInchValueBesideEachLengthInMm() {
        // 12.5 / 25.4 = 0.492126 -> 0.4921; 21.1 / 25.4 = 0.830709 -> 0.8307; 50 / 25.4 = 1.968504 -> 1.969
        assertThat(Mirrors.withInches("distance_mm 12.5 lies inside the near field (21.1 mm left in the part)"))
                .isEqualTo("distance_mm 12.5 (0.4921 in) lies inside the near field (21.1 mm (0.8307 in) left in "
                        + "the part)");
        assertThat(Mirrors.withInches("planned_scan_speed_mm_per_s 50 mm/s is above 25.4 mm/s"))
                .isEqualTo("planned_scan_speed_mm_per_s 50 mm/s (1.969 in/s) is above 25.4 mm/s (1 in/s)");
        assertThat(Mirrors.withInches("scan_length_mm 500 mm of scan")).isEqualTo("scan_length_mm 500 mm (19.69 in) of scan");
        assertThat(Mirrors.withInches("the element_pitch 0.6 mm is not below -0.254 mm"))
                .isEqualTo("the element_pitch 0.6 mm (0.02362 in) is not below -0.254 mm (-0.01 in)");
    }

    @Test
    void otherUnitsAndNumbersWithoutAPlainMmAreLeftAlone() {
        String untouched = "velocity 5.92 mm/us, area 3 mm^2, 1.000e-05 mm, depth_mm 1.5e-05 and x_mm_per_us 3";
        assertThat(Mirrors.withInches(untouched)).isEqualTo(untouched);
        assertThat(Mirrors.withInches("no lengths here")).isEqualTo("no lengths here");
    }
}
