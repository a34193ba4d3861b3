package org.exitance.support;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import java.util.stream.Stream;

/**
 * The shipped cases the tests solve, pinned by name: a case file added to or removed from
 * cases/demo or cases/validation fails {@link #demo()} and {@link #validation()} until this list
 * is edited too, so no file joins (or leaves) the tested set silently.
 */
public final class ShippedCases {
    /** The case files of cases/demo, by name. */
    public static final List<String> DEMO = List.of(
            "crucible-cavity.json",
            "electronics-box.json",
            "furnace-heat-up-lined.json",
            "furnace-sight-window.json",
            "heat-treating-chamber-facets.json",
            "heat-treating-chamber-geometry.json",
            "heat-treating-chamber.json",
            "muffle-with-part-stl.json",
            "oven-cavity-obj.json",
            "oven-shelf-two-sided.json",
            "roller-hearth-section.json",
            "selective-absorber-audit.json",
            "spacecraft-box-blankets.json",
            "spacecraft-box-geometry-orbits.json",
            "spacecraft-box-geometry.json",
            "spacecraft-box-orbit.json",
            "spacecraft-box-orbits-transient.json",
            "vacuum-furnace-shield-pack.json",
            "vacuum-hot-zone-billet.json");

    /** The case files of cases/validation, by name. */
    public static final List<String> VALIDATION = List.of(
            "gray-concentric-cylinders.json",
            "gray-concentric-spheres.json",
            "gray-parallel-plates-unknown-temperature.json",
            "gray-parallel-plates.json",
            "gray-plate-to-environment.json",
            "gray-three-surface-reradiating.json",
            "two-band-parallel-plates.json",
            "window-between-black-plates.json");

    /**
     * The benchmark cases of cases/large, by name: too large for the test suite to solve (the
     * tests read and validate them; docs/performance.md gives their runs).
     */
    public static final List<String> LARGE = List.of("closed-box-50k-facets.json");

    private ShippedCases() {
    }

    /** The repository root: the nearest directory above the working directory that holds cases/validation. */
    public static Path root() {
        for (Path p = Path.of("").toAbsolutePath(); p != null; p = p.getParent()) {
            if (Files.isDirectory(p.resolve("cases").resolve("validation"))) {
                return p;
            }
        }
        throw new IllegalStateException("cases/validation not found above " + Path.of("").toAbsolutePath());
    }

    /** The pinned demo cases, after checking that cases/demo holds exactly these case files. */
    public static List<Path> demo() {
        return pinned(root().resolve("cases").resolve("demo"), DEMO);
    }

    /** The pinned validation cases, after checking that cases/validation holds exactly these case files. */
    public static List<Path> validation() {
        return pinned(root().resolve("cases").resolve("validation"), VALIDATION);
    }

    /** The pinned benchmark cases, after checking that cases/large holds exactly these case files. */
    public static List<Path> large() {
        return pinned(root().resolve("cases").resolve("large"), LARGE);
    }

    /** Demo and validation cases, checked as above. */
    public static List<Path> all() {
        List<Path> out = new ArrayList<>(demo());
        out.addAll(validation());
        return out;
    }

    /**
     * The case files (*.json, at any depth) found in a directory, by path relative to it, sorted.
     * Other files (meshes, CSV tables, view-factor caches) are data the cases read, not cases.
     */
    public static List<String> listed(Path d) {
        try (Stream<Path> s = Files.walk(d)) {
            return s.filter(Files::isRegularFile).filter(p -> p.getFileName().toString().endsWith(".json"))
                    .map(p -> d.relativize(p).toString().replace('\\', '/')).sorted().toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * The named files of a directory, after checking that its case files are exactly those names.
     *
     * @throws AssertionError naming the files not listed and the files missing
     */
    public static List<Path> pinned(Path d, List<String> names) {
        List<String> found = listed(d);
        if (!found.equals(new ArrayList<>(new TreeSet<>(names)))) {
            TreeSet<String> extra = new TreeSet<>(found);
            extra.removeAll(names);
            TreeSet<String> missing = new TreeSet<>(names);
            missing.removeAll(found);
            throw new AssertionError(d + " differs from the pinned list in ShippedCases: not listed "
                    + extra + ", missing " + missing);
        }
        return names.stream().map(d::resolve).toList();
    }
}
