package org.exitance.cases;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import org.exitance.cli.CliRun;
import org.exitance.pipeline.ViewFactorStage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Numbers outside their documented ranges (docs/case-format.md, "Limits") are refused before
 * any work, with exit 2, the file, the JSON path and the range; and work too large for the heap
 * is refused before its arrays are allocated.
 */
class LimitsTest {
    @TempDir
    Path dir;

    private static ObjectNode surface(ObjectNode c, int i) {
        return (ObjectNode) c.get("surfaces").get(i);
    }

    /** The two plates as a geometry case: one box whose faces are 'hot' (x) and 'cold' (the rest). */
    private static ObjectNode boxCase(int nx, int ny, int nz) {
        ObjectNode c = RepoCases.plates();
        c.remove("viewFactors");
        c.remove("expected");
        for (var s : c.get("surfaces")) {
            ((ObjectNode) s).remove("area_m2");
        }
        ObjectNode box = c.putObject("geometry").putArray("parts").addObject().putObject("box");
        box.putArray("min_m").add(0).add(0).add(0);
        box.putArray("max_m").add(1).add(1).add(1);
        box.putArray("divisions").add(nx).add(ny).add(nz);
        ObjectNode faces = box.putObject("faces");
        for (String f : new String[] {"left", "right"}) {
            faces.put(f, "hot");
        }
        for (String f : new String[] {"bottom", "top", "front", "back"}) {
            faces.put(f, "cold");
        }
        return c;
    }

    @Test
    void aTemperatureOf1e300KelvinIsOutsideItsRange() {
        ObjectNode c = RepoCases.plates();
        surface(c, 0).put("temperature_K", 1e300);
        Path file = RepoCases.write(dir, "hot.json", c);
        BadInput.rejected(file, "$.surfaces[0].temperature_K", "between 0.01 K and 10000 K", "1e300");
    }

    @Test
    void aCelsiusTemperatureStatesItsRangeInCelsius() {
        ObjectNode c = RepoCases.plates();
        surface(c, 1).remove("temperature_K");
        surface(c, 1).put("temperature_C", 20000);
        Path file = RepoCases.write(dir, "celsius.json", c);
        BadInput.rejected(file, "$.surfaces[1].temperature_C", "°C", "9726.85", "20000");
    }

    @Test
    void areaConductanceAndIterationCountsHaveRanges() {
        ObjectNode c = RepoCases.plates();
        surface(c, 0).put("area_m2", 1e20);
        BadInput.rejected(RepoCases.write(dir, "area.json", c), "$.surfaces[0].area_m2", "1e12 m²");
        c = RepoCases.plates();
        c.putObject("solver").put("maxNewtonIterations", 1_000_000_000);
        BadInput.rejected(RepoCases.write(dir, "iterations.json", c), "$.solver.maxNewtonIterations", "10000");
        c = RepoCases.plates();
        c.putArray("conductiveLinks").addObject().put("conductance_W_K", 1e12).putArray("between").add("hot")
                .add("cold");
        BadInput.rejected(RepoCases.write(dir, "link.json", c), "$.conductiveLinks[0].conductance_W_K", "1e8 W/K");
    }

    @Test
    void aNumberBeyondDoublePrecisionIsNamedAsWritten() {
        String text = RepoCases.plates().toPrettyString().replaceFirst("\"temperature_K\" : 1000", "\"temperature_K\" : 1e400");
        Path file = RepoCases.writeText(dir, "beyond.json", text);
        BadInput.rejected(file, "$.surfaces[0].temperature_K", "double precision");
    }

    @Test
    void aDiscWithANormalOfZeroLengthIsBadInputNotAnInternalError() {
        ObjectNode c = boxCase(1, 1, 1);
        ObjectNode disc = ((ArrayNode) c.get("geometry").get("parts")).addObject().put("surface", "cold")
                .putObject("disc");
        disc.putArray("center_m").add(0.5).add(0.5).add(0.5);
        disc.putArray("normal").add(0).add(0).add(0);
        disc.put("radius_m", 0.1);
        Path file = RepoCases.write(dir, "disc.json", c);
        String line = BadInput.rejected(file, "$.geometry.parts[1].disc.normal", "must not be zero", "[0, 0, 0]");
        assertThat(line).doesNotContain("Vec3", "normalize");
    }

    @Test
    void divisionsOfOneHundredThousandEachAreRefusedBeforeAnyFacetIsBuilt() {
        Path file = RepoCases.write(dir, "huge-box.json", boxCase(100_000, 100_000, 100_000));
        BadInput.rejected(file, "$.geometry.parts[0].box.divisions[0]", "between 1 and 10000", "100000");
    }

    @Test
    void aBoxOfMoreFacetsThanAGeometryMayHoldIsRefusedBeforeItIsBuilt() {
        // 2 (9000·9000 + 9000 + 9000) = 1.6e8 facets, each count within its own range
        Path file = RepoCases.write(dir, "many-facets.json", boxCase(9000, 9000, 1));
        BadInput.rejected(file, "$.geometry.parts[0].box.divisions", "facets", "at most 100000");
    }

    @Test
    void viewFactorsOfTwentyThousandFacetsDoNotFitASmallHeapAndSaySo() {
        // 20,000 facets: the facet matrix alone is 20,000² doubles = 3.2 GB (8 bytes each)
        CaseDescription d = null;
        try {
            d = CaseReader.read(RepoCases.write(dir, "twenty-thousand.json", boxCase(50, 50, 75)));
        } catch (CaseException e) {
            throw new AssertionError(e.getMessage(), e);
        }
        int facets = d.geometry().scene().facetCount();
        assertThat(facets).isEqualTo(20_000);
        assertThat(ViewFactorStage.memoryNeed(facets, false)).isGreaterThanOrEqualTo(8L * facets * facets);
        long heap = 512L << 20;
        Path caseFile = d.file();
        assertThatThrownBy(() -> ViewFactorStage.requireMemory(caseFile, facets, false, heap - (100L << 20), heap))
                .isInstanceOf(CaseException.class)
                .hasMessageContaining("$.geometry")
                .hasMessageContaining("view factors of 20000 facets need about 3.21 GB")
                .hasMessageContaining("EXITANCE_JAVA_OPTS=-Xmx");
    }

    @Test
    void aModelTooLargeForAnyHeapIsRefusedOnTheCommandLineWithExitTwo() {
        // 2 (300·300 + 300·20 + 300·20) = 204,000 facets would exceed the facet limit; 2 (200·200 + 2·200·25)
        // = 100,000 facets is the limit itself, and their matrix (8e10 bytes) exceeds any test heap
        // held dense on request: compressed (the default from 8,000 facets) they would fit
        ObjectNode c = boxCase(200, 200, 25);
        ((ObjectNode) c.get("geometry")).putObject("options").put("storage", "dense");
        Path file = RepoCases.write(dir, "too-large.json", c);
        CliRun run = CliRun.of("check", file.toString());
        String line = BadInput.oneLineError(run, 2);
        assertThat(line).contains(file.toString(), "$.geometry", "100000 facets", "EXITANCE_JAVA_OPTS=-Xmx");
    }

    @Test
    void twoPlatesThatSeeOnlyEachOtherButDifferInAreaCannotBeMadeReciprocal() {
        // A_1 F_12 = A_2 F_21 with F_12 = F_21 = 1 needs A_1 = A_2 (reciprocity; Incropera et al.,
        // Fundamentals of Heat and Mass Transfer, 6th ed., Eq. 13.3, from memory)
        ObjectNode c = RepoCases.plates();
        surface(c, 1).put("area_m2", 1.0001);
        Path file = RepoCases.write(dir, "unequal-plates.json", c);
        BadInput.rejected(file, "$.viewFactors.matrix", "no reciprocal, closed set of view factors", "check the areas");
    }

    @Test
    void everyRangeIsListedInTheCaseFormatDocument() throws Exception {
        String doc = java.nio.file.Files.readString(RepoCases.root().resolve("docs").resolve("case-format.md"));
        for (Limits.Range r : Limits.ALL) {
            assertThat(doc).as(r.quantity()).contains("| " + r.quantity() + " |");
        }
    }
}
