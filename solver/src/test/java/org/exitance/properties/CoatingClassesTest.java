package org.exitance.properties;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import org.exitance.cases.MaterialFileReader;
import org.exitance.cases.MaterialFileReader.MaterialFile;
import org.exitance.spectral.source.BlackbodySource;
import org.exitance.spectral.source.IrradiationSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Plausibility of the shipped invented materials (cases/materials): their solar α/ε at 300 K
 * falls in the range typical of their coating class. The sun is taken as a 5772 K blackbody
 * (common practice). The ranges are recalled, from memory, from spacecraft thermal-control
 * practice: white paints α/ε ≈ 0.2–0.3, black paints ≈ 1, polished aluminium ≈ 3–6, gold films
 * well above 5 (α ≈ 0.2–0.3 against ε ≈ 0.02–0.04). They bound invented data, nothing more.
 */
class CoatingClassesTest {

    static Path materials() {
        Path dir = Path.of("").toAbsolutePath().getParent().resolve("cases").resolve("materials");
        assertThat(dir).as("cases/materials beside the module directory").isDirectory();
        return dir;
    }

    @ParameterizedTest(name = "{0}: α/ε in [{1}, {2}]")
    @CsvSource({
        // file,                    low,  high   (ranges from memory, see the class doc)
        "white-paint.json,          0.15, 0.35",
        "black-paint.json,          0.85, 1.20",
        "polished-aluminium.json,   3.0,  6.0",
        "gold-film.json,            5.0,  20.0",
    })
    void solarAlphaOverEpsilonFallsInTheRangeOfItsCoatingClass(String file, double low, double high) throws Exception {
        MaterialFile mf = MaterialFileReader.read(materials().resolve(file));
        assertThat(mf.isCase()).isFalse();
        assertThat(mf.title() + " " + mf.notes()).containsIgnoringCase("invented demo data");
        assertThat(mf.materials()).hasSize(1);
        MaterialSurvey s = MaterialSurvey.of(mf.materials().get(0), new double[] {300}, List.of(new BlackbodySource(5772)));
        assertThat(s.rows().get(0).alphaOverEpsilon(0)).isBetween(low, high);
    }

    @Test
    void whitePaintAbsorbsLessSunlightThanBlackPaint() throws Exception {
        // common practice: that is what white and black thermal-control paints are for
        List<IrradiationSource> sun = List.of(new BlackbodySource(5772));
        double white = MaterialSurvey.of(MaterialFileReader.read(materials().resolve("white-paint.json")).materials().get(0),
                new double[] {300}, sun).rows().get(0).absorptivity(0);
        double black = MaterialSurvey.of(MaterialFileReader.read(materials().resolve("black-paint.json")).materials().get(0),
                new double[] {300}, sun).rows().get(0).absorptivity(0);
        assertThat(white).isLessThan(0.35);
        assertThat(black).isGreaterThan(0.85);
    }
}
