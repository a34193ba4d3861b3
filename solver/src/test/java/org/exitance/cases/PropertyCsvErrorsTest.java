package org.exitance.cases;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import org.exitance.cli.CliRun;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Spectral emissivity read from a CSV file beside the case: errors name the CSV file and the line. */
class PropertyCsvErrorsTest {
    @TempDir
    Path dir;

    private Path csv;

    @BeforeEach
    void locateCsv() {
        csv = dir.resolve("plate1.csv");
    }

    /** The plates case with plate1's emissivity taken from plate1.csv in the same directory. */
    private Path caseUsingCsv(String csvText) {
        if (csvText != null) {
            RepoCases.writeText(dir, "plate1.csv", csvText);
        }
        ObjectNode c = RepoCases.plates();
        ((ObjectNode) c.get("materials")).putObject("plate1").putObject("spectralEmissivity").put("csv", "plate1.csv");
        return RepoCases.write(dir, "csv-case.json", c);
    }

    @Test
    void wellFormedCsvIsAccepted() {
        Path file = caseUsingCsv("# measured, smoothed\nwavelength_um,emissivity\n1,0.8\n5,0.8\n20,0.8\n");
        CliRun run = CliRun.of("check", file.toString());
        assertThat(run.exitCode()).as(run.toString()).isZero();
    }

    @Test
    void csvWithATemperatureColumnIsAccepted() {
        Path file = caseUsingCsv("temperature_K,wavelength_um,emissivity\n300,1,0.7\n300,10,0.8\n900,1,0.6\n900,10,0.9\n");
        CliRun run = CliRun.of("solve", file.toString());
        assertThat(run.exitCode()).as(run.toString()).isZero();
    }

    @Test
    void missingCsvIsNamedAtTheReferringKey() {
        Path file = caseUsingCsv(null);
        BadInput.rejectedNaming(file, csv, "$.materials.plate1.spectralEmissivity.csv", "property file not found");
    }

    @Test
    void csvWithABadHeaderIsRejected() {
        Path file = caseUsingCsv("lambda,eps\n1,0.8\n5,0.8\n");
        BadInput.rejectedNaming(file, csv, null, "line 1:", "header", "wavelength_um,emissivity", "lambda,eps");
    }

    @Test
    void badHeaderAfterCommentsNamesItsOwnLine() {
        Path file = caseUsingCsv("# from a reflectance measurement\n\nwavelength,emissivity\n1,0.8\n");
        BadInput.rejectedNaming(file, csv, null, "line 3:", "header");
    }

    @Test
    void csvWithANonNumberNamesTheLine() {
        Path file = caseUsingCsv("wavelength_um,emissivity\n1,0.8\n5,high\n20,0.8\n");
        BadInput.rejectedNaming(file, csv, null, "line 3:", "emissivity is not a number", "'high'");
    }

    @Test
    void csvNonNumberOnTheLastLineWithoutNewlineNamesThatLine() {
        Path file = caseUsingCsv("wavelength_um,emissivity\n1,0.8\n5,x");
        BadInput.rejectedNaming(file, csv, null, "line 3:", "not a number");
    }

    @Test
    void csvLineNumbersCountCommentAndBlankLines() {
        Path file = caseUsingCsv("# source: measured\n# smoothed\nwavelength_um,emissivity\n1,0.8\n\n# gap\n5,oops\n");
        BadInput.rejectedNaming(file, csv, null, "line 7:", "not a number");
    }

    @Test
    void csvWithDecreasingWavelengthsNamesTheLine() {
        Path file = caseUsingCsv("wavelength_um,emissivity\n1,0.8\n5,0.7\n4,0.6\n");
        BadInput.rejectedNaming(file, csv, null, "line 4:", "wavelengths must increase");
    }

    @Test
    void csvWithEmissivityAboveOneNamesTheLine() {
        Path file = caseUsingCsv("wavelength_um,emissivity\n1,0.8\n5,1.7\n");
        BadInput.rejectedNaming(file, csv, null, "line 3:", "[0, 1]");
    }
}
