package org.exitance.cases;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Keys that are unknown, missing, of the wrong type, or that name things that do not exist. */
class KeyAndTypeErrorsTest {
    @TempDir
    Path dir;

    private static ObjectNode surface(ObjectNode c, int i) {
        return (ObjectNode) c.get("surfaces").get(i);
    }

    @Test
    void unknownTopLevelKeyIsNamedWithTheAllowedOnes() {
        ObjectNode c = RepoCases.plates();
        c.put("surface", "typo");
        Path file = RepoCases.write(dir, "unknown-top.json", c);
        BadInput.rejected(file, "$.surface", "unknown key 'surface'", "allowed here:", "surfaces");
    }

    @Test
    void unknownKeyInsideASurfaceNamesTheSurfacePath() {
        ObjectNode c = RepoCases.plates();
        surface(c, 1).put("emissivity", 0.5);
        Path file = RepoCases.write(dir, "unknown-in-surface.json", c);
        BadInput.rejected(file, "$.surfaces[1].emissivity", "unknown key 'emissivity'");
    }

    @Test
    void surfaceWithoutAreaIsMissingARequiredField() {
        ObjectNode c = RepoCases.plates();
        surface(c, 1).remove("area_m2");
        Path file = RepoCases.write(dir, "no-area.json", c);
        BadInput.rejected(file, "$.surfaces[1]", "missing required key 'area_m2'");
    }

    @Test
    void caseWithoutViewFactorsOrGeometryIsRejected() {
        ObjectNode c = RepoCases.plates();
        c.remove("viewFactors");
        Path file = RepoCases.write(dir, "no-view-factors.json", c);
        BadInput.rejected(file, "$", "needs one of viewFactors, geometry");
    }

    @Test
    void stringWhereANumberIsExpectedIsAWrongType() {
        ObjectNode c = RepoCases.plates();
        surface(c, 1).put("area_m2", "1.0");
        Path file = RepoCases.write(dir, "string-area.json", c);
        BadInput.rejected(file, "$.surfaces[1].area_m2", "expected a number", "string");
    }

    @Test
    void wrongTypeErrorCarriesTheExactPath() {
        ObjectNode c = RepoCases.plates();
        surface(c, 1).put("area_m2", "1.0");
        Path file = RepoCases.write(dir, "string-area.json", c);
        CaseException e = catchThrowableOfType(CaseException.class, () -> CaseReader.read(file));
        assertThat(e).isNotNull();
        assertThat(e.jsonPath()).isEqualTo("$.surfaces[1].area_m2");
        assertThat(e.file()).isEqualTo(file);
    }

    @Test
    void unknownMaterialIsNamedWithTheDeclaredOnes() {
        ObjectNode c = RepoCases.plates();
        surface(c, 0).put("material", "unobtainium");
        Path file = RepoCases.write(dir, "unknown-material.json", c);
        BadInput.rejected(file, "$.surfaces[0].material", "unknown material 'unobtainium'", "plate1", "plate2");
    }

    @Test
    void duplicateSurfaceNamesPointAtTheSecondOne() {
        ObjectNode c = RepoCases.plates();
        surface(c, 1).put("name", "hot");
        Path file = RepoCases.write(dir, "duplicate-names.json", c);
        BadInput.rejected(file, "$.surfaces[1].name", "duplicate surface name 'hot'", "$.surfaces[0]");
    }
}
