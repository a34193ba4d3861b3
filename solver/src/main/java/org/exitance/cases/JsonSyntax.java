package org.exitance.cases;

import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The parser's description of a JSON syntax error in the words of the file: what was found and
 * what JSON allows there, without the parser's option names, class names or internal limits.
 */
final class JsonSyntax {
    private record Rule(Pattern pattern, String replacement) {
    }

    private static final List<Rule> RULES = List.of(
            rule("Non-standard token '([^']*)'.*", "'$1' is not a JSON number (write a finite number)"),
            rule(".*in numeric value: JSON spec does not allow numbers to have plus signs.*",
                    "JSON numbers have no leading plus sign"),
            rule(".*Leading zeroes not allowed.*", "JSON numbers have no leading zeroes"),
            rule(".*maybe a \\(non-standard\\) comment.*", "JSON has no comments"),
            rule("Trailing token.*", "more content after the end of the JSON value"),
            rule("Document nesting depth.*", "arrays and objects are nested too deeply"),
            rule("Number value length.*", "a number has too many digits"),
            rule("String value length.*", "a string is too long"),
            rule("Name length.*", "a key is too long"),
            rule("Unexpected end-of-input: expected close marker for (\\w+) \\(start marker at (line \\d+, column \\d+)\\).*",
                    "the file ends inside the $1 that starts at $2 (expected close marker)"),
            rule("Unexpected end-of-input.*", "the file ends before the JSON value is complete"));

    private JsonSyntax() {
    }

    private static Rule rule(String regex, String replacement) {
        return new Rule(Pattern.compile(regex, Pattern.DOTALL), replacement);
    }

    /** The problem in plain words; positions are given by the caller. */
    static String plain(String parserMessage) {
        String m = CaseException.oneLine(parserMessage)
                .replaceAll("\\[Source: [^\\]]*?line: (\\d+), column: (\\d+)\\]", "line $1, column $2")
                .replaceAll("\\s*\\[Source: [^\\]]*\\]", "");
        for (Rule r : RULES) {
            Matcher x = r.pattern.matcher(m);
            if (x.matches()) {
                return x.replaceFirst(r.replacement);
            }
        }
        // whatever else the parser says: keep what it found, never its option or class names
        m = m.replaceAll("\\s*\\(code \\d+\\)", "").replaceAll(":? ?enable `[^`]*` to allow", "");
        if (m.contains("`") || m.contains("Feature") || m.contains("com.fasterxml") || m.contains("Jackson")) {
            return "not valid JSON here";
        }
        return m;
    }
}
