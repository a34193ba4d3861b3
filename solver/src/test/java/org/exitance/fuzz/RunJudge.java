package org.exitance.fuzz;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.Iterator;
import java.util.Map;
import java.util.regex.Pattern;
import org.exitance.cli.CliRun;

/**
 * What a run of the command line may do with any input: exit 2 or 3 with exactly one line on
 * standard error and nothing else, or exit 0 with output free of NaN and Infinity (JSON that a
 * strict parser reads, numbers all finite) and, for a solve, an energy balance that closes. Exit 3
 * may also come with output when the view factors miss their tolerance: then the output must pass
 * the checks of exit 0 and the last line on standard error must say so.
 * Never exit 1, never a stack trace, never a library's internals in a message.
 */
final class RunJudge {
    private static final ObjectMapper STRICT = new ObjectMapper();
    private static final Pattern NON_FINITE_WORD = Pattern.compile("(?<![A-Za-z_])(NaN|-?Infinity)(?![A-Za-z_])");
    private static final String[] INTERNALS = {"\tat ", "Exception", "internal error", "com.fasterxml", "Vec3[",
        "java.", "Jackson", "Feature", "`", "OutOfMemory", "StackOverflow"};

    private RunJudge() {
    }

    /**
     * @param json  whether the command wrote JSON
     * @param solve whether it was a solve (its balance is checked)
     * @return null when the run kept every promise, else what it broke
     */
    static String judge(CliRun run, boolean json, boolean solve) {
        int code = run.exitCode();
        if (code == 3 && !run.out().isEmpty()) {
            java.util.List<String> err = run.errLines();
            String last = err.isEmpty() ? "" : err.get(err.size() - 1);
            if (!(last.startsWith("exitance: ") && last.contains("view-factor tolerance") && last.contains("not met"))) {
                return "exit 3 with output on stdout, but not for the view-factor tolerance";
            }
            for (String w : err.subList(0, err.size() - 1)) {
                if (!w.startsWith("exitance: warning: ") || w.contains("view-factor tolerance")) {
                    return "exit 3: unexpected line on stderr: " + w;
                }
            }
            code = 0;
        } else if (code == 2 || code == 3) {
            if (!run.out().isEmpty()) {
                return "exit " + code + " with output on stdout";
            }
            if (run.errLines().size() != 1) {
                return "exit " + code + " with " + run.errLines().size() + " lines on stderr";
            }
            String line = run.errLines().get(0);
            if (!line.startsWith("exitance: ")) {
                return "error line does not start with 'exitance: '";
            }
            for (String bad : INTERNALS) {
                if (line.contains(bad)) {
                    return "error line shows '" + bad.trim() + "'";
                }
            }
            return null;
        }
        if (code != 0) {
            return "exit " + code;
        }
        if (run.err().contains("\tat ") || run.out().contains("\tat org.") || run.out().contains("\tat java.")) {
            return "a stack trace with exit 0";
        }
        if (!json) {
            return NON_FINITE_WORD.matcher(run.out()).find() ? "NaN or Infinity in the output" : null;
        }
        JsonNode root;
        try {
            root = STRICT.readTree(run.out());
        } catch (Exception e) {
            return "output is not strict JSON: " + e.getMessage().lines().findFirst().orElse("");
        }
        String bad = nonFinite(root, "$");
        if (bad != null) {
            return "non-finite value at " + bad;
        }
        return solve ? balance(root) : null;
    }

    private static String nonFinite(JsonNode n, String path) {
        if (n.isNumber() && !Double.isFinite(n.doubleValue())) {
            return path;
        }
        if (n.isTextual() && NON_FINITE_WORD.matcher(n.textValue()).matches()) {
            return path + " (the string " + n.textValue() + ")";
        }
        if (n.isObject()) {
            Iterator<Map.Entry<String, JsonNode>> it = n.fields();
            while (it.hasNext()) {
                Map.Entry<String, JsonNode> e = it.next();
                String bad = nonFinite(e.getValue(), path + "." + e.getKey());
                if (bad != null) {
                    return bad;
                }
            }
        }
        if (n.isArray()) {
            for (int i = 0; i < n.size(); i++) {
                String bad = nonFinite(n.get(i), path + "[" + i + "]");
                if (bad != null) {
                    return bad;
                }
            }
        }
        return null;
    }

    /** Every solved result says its energy balance closes. */
    private static String balance(JsonNode root) {
        if (root.has("loadCases")) {
            for (JsonNode lc : root.get("loadCases")) {
                String bad = closes(lc.get("result"), "load case " + lc.path("name").asText());
                if (bad != null) {
                    return bad;
                }
            }
            return null;
        }
        return closes(root, "the result");
    }

    private static String closes(JsonNode r, String what) {
        if (r == null || !r.path("energyBalanceCloses").asBoolean(false)) {
            return "exit 0 but the energy balance of " + what + " does not close (relative "
                    + (r == null ? "?" : r.path("energyBalanceRelative").asText()) + ")";
        }
        return null;
    }
}
