package org.exitance.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.exitance.report.Numbers;
import org.exitance.report.SolveJsonWriter;
import org.exitance.report.TextTable;
import org.exitance.validation.CaseVerdict;
import org.exitance.validation.CheckOutcome;
import org.exitance.validation.ValidationRunner;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code exitance verify}: runs the shipped validation cases against their published references. */
@Command(name = "verify", mixinStandardHelpOptions = true,
        description = {"Run the validation cases against their published references.",
                "Prints computed against expected values with each case's source, pass or fail (default "
                + "directory: cases/validation)."},
        footer = {"", ExitCodes.HELP})
final class VerifyCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", arity = "0..1", paramLabel = "DIR|CASE.json",
            description = "A directory of validation cases or one case (default: cases/validation).")
    private Path where = Path.of("cases", "validation");

    @Mixin
    private SharedOptions.Json json;

    @Override
    public Integer call() throws IOException {
        List<Path> files;
        if (Files.isDirectory(where)) {
            files = ValidationRunner.casesIn(where);
        } else if (Files.isRegularFile(where)) {
            files = List.of(where);
        } else {
            throw new UserError(where + ": no such directory or file (run from the project root, or name the"
                    + " directory of validation cases)", ExitCodes.BAD_INPUT);
        }
        if (files.isEmpty()) {
            throw new UserError(where + ": no validation cases (*.json) found", ExitCodes.BAD_INPUT);
        }
        List<CaseVerdict> verdicts = new ArrayList<>();
        for (Path f : files) {
            verdicts.add(ValidationRunner.run(f));
        }
        PrintWriter out = spec.commandLine().getOut();
        if (json.on()) {
            out.println(SolveJsonWriter.MAPPER.writeValueAsString(VerdictJson.toJson(verdicts)));
        } else {
            writeTable(verdicts, out);
        }
        out.flush();
        return verdicts.stream().allMatch(CaseVerdict::passed) ? ExitCodes.OK : ExitCodes.CHECK_FAILED;
    }

    private static void writeTable(List<CaseVerdict> verdicts, PrintWriter out) {
        int passedChecks = 0;
        int failedChecks = 0;
        for (CaseVerdict v : verdicts) {
            out.println((v.passed() ? "PASS  " : "FAIL  ") + v.file().getFileName()
                    + (v.title().isEmpty() ? "" : " — " + v.title()));
            if (!v.source().isEmpty()) {
                out.println("      source: " + v.source());
            }
            if (v.error() != null) {
                out.println("      could not run: " + v.error());
                failedChecks++;
                continue;
            }
            TextTable t = new TextTable(List.of("Target", "Quantity", "Expected", "Computed", "Difference",
                    "Allowed", "Result"), new boolean[] {false, false, true, true, true, true, false});
            for (CheckOutcome c : v.checks()) {
                t.row(List.of(c.target(), c.quantity(), fmt(c.expected()), fmt(c.computed()),
                        Numbers.small(c.computed() - c.expected()), Numbers.small(c.allowed()),
                        c.passed() ? "pass" : "FAIL"));
                if (c.passed()) {
                    passedChecks++;
                } else {
                    failedChecks++;
                }
            }
            t.render(6).forEach(out::println);
            out.println("      energy balance: " + Numbers.small(v.energyBalanceRelative()) + " relative");
            out.println();
        }
        long casesPassed = verdicts.stream().filter(CaseVerdict::passed).count();
        out.println("Validation: " + casesPassed + " of " + verdicts.size() + " cases pass");
        out.println("verify: " + passedChecks + " passed, " + failedChecks + " failed");
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.8g", v);
    }
}
