package org.exitance.cases;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import org.exitance.conduction.OuterBoundary;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Reading thermal masses, walls and the time block, and rejecting bad ones with a path. */
class TimeAndStorageKeysTest {
    private static final String CASE = """
            {"materials": {"m": {"emissivity": 0.5}},
             "surfaces": [
               {"name": "a", "material": "m", "area_m2": 1, "dissipation_W": 10,
                "thermalMass": %s},
               {"name": "b", "material": "m", "area_m2": 1, "adiabatic": true,
                "wall": {"layers": [{"thickness_m": 0.1, "conductivity_W_mK": 0.5, "density_kg_m3": 900,
                                     "specificHeat_J_kgK": 1000, "cells": 12}],
                         "outside": %s}}],
             "environment": {"name": "room", "temperature_C": 20},
             "viewFactors": {"matrix": [[0, 0.5], [0.5, 0]]},
             "time": %s}
            """;
    private static final String MASS = "{\"mass_kg\": 2, \"specificHeat_J_kgK\": 500}";
    private static final String OUT = "{\"convection_W_m2K\": 5, \"emissivity\": 0.7, \"ambient_C\": 20}";
    private static final String TIME = "{\"duration_s\": 3600, \"initialTemperature_C\": 20,"
            + " \"schedules\": [{\"surface\": \"a\", \"dissipation_W\": {\"time_s\": [0, 600], \"value\": [0, 50]}}],"
            + " \"thermostats\": [{\"heater\": \"a\", \"sensor\": \"b\", \"on_C\": 30, \"off_C\": 35, \"power_W\": 5}],"
            + " \"targets\": [{\"surface\": \"b\", \"temperature_C\": 40}], \"output\": {\"every_s\": 60}}";

    private static Path write(Path dir, String mass, String outside, String time) throws Exception {
        Path f = dir.resolve("c.json");
        Files.writeString(f, String.format(CASE, mass, outside, time));
        return f;
    }

    @Test
    void massWallAndTimeBlockAreRead(@TempDir Path dir) throws Exception {
        CaseDescription c = CaseReader.read(write(dir, MASS, OUT, TIME));
        assertThat(c.capacities().get("a").jPerK(400)).isEqualTo(1000);
        assertThat(c.walls().get("b").layers()).hasSize(1);
        assertThat(c.walls().get("b").outside()).isEqualTo(new OuterBoundary.Exposed(5, 0.7, 293.15));
        assertThat(c.time().durationS()).isEqualTo(3600);
        assertThat(c.time().initialK()).isEqualTo(293.15);
        assertThat(c.drivers().power().get("a").at(300)).isEqualTo(25);
        assertThat(c.drivers().thermostats().get(0).offAboveK()).isEqualTo(308.15);
    }

    @Test
    void aMassOnAFixedTemperatureSurfaceIsRejected(@TempDir Path dir) throws Exception {
        Path f = write(dir, MASS, OUT, TIME);
        Files.writeString(f, Files.readString(f).replace("\"dissipation_W\": 10,", "\"temperature_K\": 300,"));
        assertThatThrownBy(() -> CaseReader.read(f)).isInstanceOf(CaseException.class)
                .hasMessageContaining("$.surfaces[0].thermalMass").hasMessageContaining("dissipation_W or adiabatic");
    }

    @Test
    void badNumbersNameTheirPath(@TempDir Path dir) throws Exception {
        assertThatThrownBy(() -> CaseReader.read(write(dir, "{\"mass_kg\": -2, \"specificHeat_J_kgK\": 500}", OUT, TIME)))
                .isInstanceOf(CaseException.class).hasMessageContaining("$.surfaces[0].thermalMass.mass_kg");
        assertThatThrownBy(() -> CaseReader.read(write(dir, MASS, "{\"convection_W_m2K\": 0, \"ambient_C\": 20}", TIME)))
                .isInstanceOf(CaseException.class).hasMessageContaining("$.surfaces[1].wall.outside");
        assertThatThrownBy(() -> CaseReader.read(write(dir, MASS, OUT, TIME.replace("3600", "-1"))))
                .isInstanceOf(CaseException.class).hasMessageContaining("$.time.duration_s");
        assertThatThrownBy(() -> CaseReader.read(write(dir, MASS, OUT, TIME.replace("\"off_C\": 35", "\"off_C\": 25"))))
                .isInstanceOf(CaseException.class).hasMessageContaining("$.time.thermostats[0]");
        assertThatThrownBy(() -> CaseReader.read(write(dir, MASS, OUT, TIME.replace("[0, 600]", "[600, 0]"))))
                .isInstanceOf(CaseException.class).hasMessageContaining("$.time.schedules[0].dissipation_W.time_s[1]");
        assertThatThrownBy(() -> CaseReader.read(write(dir, MASS, OUT, TIME.replace("\"surface\": \"b\"", "\"surface\": \"z\""))))
                .isInstanceOf(CaseException.class).hasMessageContaining("$.time.targets[0].surface");
    }
}
