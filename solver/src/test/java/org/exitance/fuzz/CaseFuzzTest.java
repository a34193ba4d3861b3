package org.exitance.fuzz;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import org.exitance.cases.RepoCases;
import org.exitance.cli.CliRun;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestReporter;
import org.junit.jupiter.api.io.TempDir;

/**
 * Heavy fuzzing in one JVM: every shipped case (cases/demo, cases/validation) and the CSV, STL and
 * OBJ files they refer to are mutated many times ({@link JsonMutator}, {@link SideFileMutator})
 * and each mutant is run through the command line in process (reader, geometry, solver, writers).
 * Every run must keep the promises of {@link RunJudge} within a time limit. Geometry is made cheap
 * first (division counts at most 2, 4 around an axis), so that mutants stay fast to solve. A case
 * solved on facets is mutated twice over, once with its facet view factors held compressed.
 *
 * <p>System properties: {@code exitance.fuzz.seed} (default {@value #DEFAULT_SEED}),
 * {@code exitance.fuzz.count} (default {@value #DEFAULT_COUNT}), {@code exitance.fuzz.only} (one
 * mutant index, to reproduce a failure), {@code exitance.fuzz.timeoutSeconds} (default
 * {@value #DEFAULT_TIMEOUT_S}). Failing mutants are kept in target/fuzz-failures/.
 */
class CaseFuzzTest {
    static final long DEFAULT_SEED = 20_250_611L;
    static final int DEFAULT_COUNT = 10_000;
    static final int DEFAULT_TIMEOUT_S = 30;
    /** Mutants run side by side in this many lanes (each with its own copy of the cases). */
    static final int LANES = 2;
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    /** A shipped case made cheap, with the files it refers to. */
    private record Base(String name, Path caseDir, ObjectNode tree, List<String> sideKeys) {
    }

    /** What one lane of runs found. */
    private record Lane(int ran, Map<Integer, Integer> exits, Map<Integer, String> failures) {
    }

    @Test
    void mutatedShippedCasesExitTwoOrThreeWithOneLineOrSolveCleanly(TestReporter reporter) throws Exception {
        long seed = Long.getLong("exitance.fuzz.seed", DEFAULT_SEED);
        int count = Integer.getInteger("exitance.fuzz.count", DEFAULT_COUNT);
        int only = Integer.getInteger("exitance.fuzz.only", -1);
        int timeout = Integer.getInteger("exitance.fuzz.timeoutSeconds", DEFAULT_TIMEOUT_S);
        int lanes = Math.max(1, Math.min(LANES, Runtime.getRuntime().availableProcessors()));
        List<List<Base>> bases = new ArrayList<>();
        for (int l = 0; l < lanes; l++) {
            bases.add(bases(dir.resolve("lane" + l)));
        }
        assertThat(bases.get(0)).hasSizeGreaterThanOrEqualTo(10);
        long start = System.nanoTime();
        ExecutorService pool = Executors.newFixedThreadPool(lanes, daemon());
        List<Future<Lane>> results = new ArrayList<>();
        for (int l = 0; l < lanes; l++) {
            int lane = l;
            results.add(pool.submit(() -> lane(bases.get(lane), lane, lanes, seed, count, only, timeout)));
        }
        int ran = 0;
        Map<Integer, Integer> exits = new TreeMap<>();
        Map<Integer, String> failures = new TreeMap<>();
        for (Future<Lane> f : results) {
            Lane r = f.get();
            ran += r.ran();
            r.exits().forEach((k, v) -> exits.merge(k, v, Integer::sum));
            failures.putAll(r.failures());
        }
        pool.shutdownNow();
        double seconds = (System.nanoTime() - start) * 1e-9;
        String summary = String.format(java.util.Locale.ROOT,
                "case fuzz: %d mutants of %d shipped cases, seed %d, %d lanes, %.1f s, exit codes %s, %d failures",
                ran, bases.get(0).size(), seed, lanes, seconds, exits, failures.size());
        System.out.println(summary);
        reporter.publishEntry("fuzz", summary);
        assertThat(failures.values()).as(summary).isEmpty();
        if (only < 0) {
            assertThat(ran).isGreaterThanOrEqualTo(Math.min(count, DEFAULT_COUNT));
        }
    }

    /** Runs mutants lane, lane + lanes, ... in order, each within the time limit. */
    private static Lane lane(List<Base> bases, int lane, int lanes, long seed, int count, int only, int timeout)
            throws Exception {
        ExecutorService runner = Executors.newSingleThreadExecutor(daemon());
        int ran = 0;
        Map<Integer, Integer> exits = new TreeMap<>();
        Map<Integer, String> failures = new TreeMap<>();
        for (int i = lane; i < count; i += lanes) {
            if (only >= 0 && i != only) {
                continue;
            }
            Random random = new Random(seed * 0x9E3779B97F4A7C15L + i);
            Base base = bases.get(i % bases.size());
            List<String> log = new ArrayList<>();
            Path file = mutant(base, random, log);
            String[] args = command(random, file, base);
            long t0 = System.nanoTime();
            Future<CliRun> f = runner.submit(() -> CliRun.of(args));
            String problem;
            CliRun run = null;
            try {
                run = f.get(timeout, TimeUnit.SECONDS);
                problem = RunJudge.judge(run, List.of(args).contains("--json"), args[0].equals("solve"));
            } catch (TimeoutException e) {
                f.cancel(true);
                runner.shutdownNow();
                runner = Executors.newSingleThreadExecutor(daemon());
                problem = "no answer within " + timeout + " s";
            }
            ran++;
            if (Boolean.getBoolean("exitance.fuzz.profile")) {
                System.out.println("fuzz-time " + base.name() + " " + args[0] + " " + (run == null ? -1 : run.exitCode())
                        + " " + (System.nanoTime() - t0) / 1_000_000);
            }
            exits.merge(run == null ? -1 : run.exitCode(), 1, Integer::sum);
            if (problem != null) {
                failures.put(i, "#" + i + " " + base.name() + " [" + String.join(" ", args)
                        .replace(base.caseDir().toString(), "") + "]: " + problem + "; mutations: "
                        + String.join("; ", log) + (run == null ? "" : "; stderr: " + run.err().lines().limit(3).toList()));
                keep(i, base, file);
            }
        }
        runner.shutdownNow();
        return new Lane(ran, exits, failures);
    }

    private static java.util.concurrent.ThreadFactory daemon() {
        return r -> {
            Thread t = new Thread(r, "fuzz-run");
            t.setDaemon(true);
            return t;
        };
    }

    /** One of the commands a user would run on the mutant. */
    private static String[] command(Random random, Path file, Base base) {
        String f = file.toString();
        int dice = random.nextInt(100);
        if (dice < 50) {
            return random.nextBoolean() ? new String[] {"solve", "--json", f} : new String[] {"solve", "--json",
                "--no-audit", f};
        }
        if (dice < 65) {
            return new String[] {"check", f};
        }
        if (dice < 78) {
            return new String[] {"solve", f};
        }
        if (dice < 88) {
            return new String[] {"audit", "--json", f};
        }
        if (dice < 93) {
            return new String[] {"view-factors", "--json", f};
        }
        if (dice < 97) {
            JsonNode s = base.tree().path("surfaces").path(0).path("name");
            return new String[] {"sensitivity", "--json", "--of", s.asText("x"), f};
        }
        return new String[] {"material", "--json", f};
    }

    /** Writes a mutant of the base beside it (the same name each time, so the view-factor cache serves it). */
    private static Path mutant(Base base, Random random, List<String> log) throws IOException {
        ObjectNode tree = base.tree().deepCopy();
        if (!base.sideKeys().isEmpty() && random.nextInt(4) == 0) {
            mutateSideFile(base, tree, random, log);
        }
        JsonMutator m = new JsonMutator(random, log);
        int mutations = 1 + (random.nextInt(10) < 5 ? 0 : random.nextInt(3));
        for (int k = 0; k < mutations; k++) {
            m.mutate(tree);
        }
        String text = JSON.writerWithDefaultPrettyPrinter().writeValueAsString(tree);
        if (random.nextInt(10) == 0) {
            text = m.mutateText(text);
        }
        return Files.writeString(base.caseDir().resolve("fz-" + base.name()), text, StandardCharsets.UTF_8);
    }

    /** Points one of the case's file references at a mutated copy of that file. */
    private static void mutateSideFile(Base base, ObjectNode tree, Random random, List<String> log)
            throws IOException {
        String pointer = base.sideKeys().get(random.nextInt(base.sideKeys().size()));
        JsonNode ref = tree.at(pointer);
        Path original = base.caseDir().resolve(ref.asText());
        byte[] data = new SideFileMutator(random, log).mutate(original.getFileName().toString(),
                Files.readAllBytes(original));
        String name = "fz-side-" + base.name() + "-" + original.getFileName();
        Files.write(base.caseDir().resolve(name), data);
        int slash = pointer.lastIndexOf('/');
        ((ObjectNode) tree.at(pointer.substring(0, slash))).put(pointer.substring(slash + 1), name);
    }

    /** The shipped cases copied into the temporary directory, their geometry made cheap. */
    private static List<Base> bases(Path laneDir) throws IOException {
        Path root = RepoCases.root().resolve("cases");
        List<Base> out = new ArrayList<>();
        for (String group : new String[] {"demo", "validation"}) {
            Path to = laneDir.resolve(group);
            copyTree(root.resolve(group), to);
            try (var files = Files.list(to)) {
                for (Path p : files.filter(x -> x.toString().endsWith(".json")).sorted().toList()) {
                    ObjectNode tree = (ObjectNode) JSON.readTree(p.toFile());
                    cheapen(tree, "");
                    List<String> sideKeys = new ArrayList<>();
                    findFileKeys(tree, "", sideKeys);
                    out.add(new Base(p.getFileName().toString(), to, tree, sideKeys));
                    if (tree.at("/geometry/options/resolution").asText().equals("facets")) {
                        // the same case with its facet view factors held compressed (geometry.options.storage)
                        ObjectNode compressed = tree.deepCopy();
                        ((ObjectNode) compressed.at("/geometry/options")).put("storage", "compressed");
                        out.add(new Base(p.getFileName().toString().replace(".json", "-compressed.json"), to,
                                compressed, sideKeys));
                    }
                }
            }
        }
        return out;
    }

    private static void copyTree(Path from, Path to) throws IOException {
        try (var walk = Files.walk(from)) {
            for (Path p : walk.toList()) {
                Path target = to.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(target);
                } else if (!p.toString().endsWith(".vfcache")) {
                    Files.copy(p, target);
                }
            }
        }
    }

    /** Division counts at most 2 (4 around an axis), so that every mutant's view factors are cheap. */
    private static void cheapen(JsonNode n, String key) {
        if (n instanceof ObjectNode o) {
            JsonNode d = o.get("divisions");
            if (d instanceof ArrayNode a) {
                int around = switch (key) {
                    case "disc", "annulus", "sphere" -> 1;
                    case "cylinder", "cone", "cylindricalCavity" -> 0;
                    default -> -1;
                };
                for (int i = 0; i < a.size(); i++) {
                    a.set(i, Math.min(a.get(i).asInt(), i == around ? 4 : 2));
                }
            }
            o.fields().forEachRemaining(e -> cheapen(e.getValue(), e.getKey()));
        } else if (n instanceof ArrayNode a) {
            a.forEach(x -> cheapen(x, key));
        }
    }

    /** JSON pointers of the keys that name a file: a material's or a source's "csv", a mesh's "file". */
    private static void findFileKeys(JsonNode n, String pointer, List<String> out) {
        if (n instanceof ObjectNode o) {
            o.fields().forEachRemaining(e -> {
                String p = pointer + "/" + e.getKey();
                if ((e.getKey().equals("csv") || e.getKey().equals("file")) && e.getValue().isTextual()) {
                    out.add(p);
                }
                findFileKeys(e.getValue(), p, out);
            });
        } else if (n instanceof ArrayNode a) {
            for (int i = 0; i < a.size(); i++) {
                findFileKeys(a.get(i), pointer + "/" + i, out);
            }
        }
    }

    /** Keeps a failing mutant (and its side files) in target/fuzz-failures for reproduction. */
    private static void keep(int i, Base base, Path file) {
        try {
            Path to = Path.of("target", "fuzz-failures", i + "-" + base.name().replace(".json", ""));
            Files.createDirectories(to);
            Files.copy(file, to.resolve(file.getFileName()), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
            try (var side = Files.list(base.caseDir())) {
                for (Path p : side.filter(x -> x.getFileName().toString().startsWith("fz-side-" + base.name()))
                        .toList()) {
                    Files.copy(p, to.resolve(p.getFileName()), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
                }
            }
        } catch (IOException e) {
            // the failure itself is reported; keeping a copy is a convenience
        }
    }
}
