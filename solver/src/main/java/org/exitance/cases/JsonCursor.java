package org.exitance.cases;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Iterator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * A position in a JSON tree that knows its file and JSON path, so every validation error can
 * name both. Reading methods throw {@link CaseException} with a one-line message.
 */
public final class JsonCursor {
    private final JsonNode node;
    private final String path;
    private final Path file;

    JsonCursor(JsonNode node, String path, Path file) {
        this.node = node;
        this.path = path;
        this.file = file;
    }

    static JsonCursor root(JsonNode node, Path file) {
        return new JsonCursor(node, "$", file);
    }

    public String path() {
        return path;
    }

    public Path file() {
        return file;
    }

    JsonNode node() {
        return node;
    }

    /** An error at this position. */
    public CaseException error(String problem) {
        return new CaseException(file, path, problem);
    }

    private String childPath(String key) {
        return key.matches("[A-Za-z_][A-Za-z0-9_]*") ? path + "." + key : path + "['" + key + "']";
    }

    /** Requires this node to be an object. */
    public JsonCursor object() throws CaseException {
        if (!node.isObject()) {
            throw error("expected an object, got " + describe(node));
        }
        return this;
    }

    /** Rejects keys not in the list. */
    public JsonCursor allowOnly(String... keys) throws CaseException {
        object();
        Set<String> allowed = new LinkedHashSet<>(Arrays.asList(keys));
        Iterator<String> it = node.fieldNames();
        while (it.hasNext()) {
            String k = it.next();
            if (!allowed.contains(k)) {
                throw new CaseException(file, childPath(k), "unknown key '" + k + "' (allowed here: "
                        + String.join(", ", allowed) + ")");
            }
        }
        return this;
    }

    public boolean has(String key) {
        return node.isObject() && node.has(key);
    }

    /** A required field. */
    public JsonCursor field(String key) throws CaseException {
        object();
        JsonNode child = node.get(key);
        if (child == null) {
            throw error("missing required key '" + key + "'");
        }
        return new JsonCursor(child, childPath(key), file);
    }

    /** An optional field. */
    public Optional<JsonCursor> optional(String key) throws CaseException {
        object();
        JsonNode child = node.get(key);
        return child == null ? Optional.empty() : Optional.of(new JsonCursor(child, childPath(key), file));
    }

    /** Exactly one of the keys must be present; returns its name. */
    public String exactlyOneOf(String... keys) throws CaseException {
        object();
        List<String> present = new ArrayList<>();
        for (String k : keys) {
            if (node.has(k)) {
                present.add(k);
            }
        }
        if (present.size() != 1) {
            throw error((present.isEmpty() ? "needs one of " : "has more than one of ") + String.join(", ", keys)
                    + (present.isEmpty() ? "" : " (found " + String.join(", ", present) + ")"));
        }
        return present.get(0);
    }

    /** The object's fields in file order. */
    public List<Map.Entry<String, JsonCursor>> entries() throws CaseException {
        object();
        List<Map.Entry<String, JsonCursor>> out = new ArrayList<>();
        Iterator<Map.Entry<String, JsonNode>> it = node.fields();
        while (it.hasNext()) {
            Map.Entry<String, JsonNode> e = it.next();
            out.add(Map.entry(e.getKey(), new JsonCursor(e.getValue(), childPath(e.getKey()), file)));
        }
        return out;
    }

    /** The array's elements. */
    public List<JsonCursor> elements() throws CaseException {
        if (!node.isArray()) {
            throw error("expected an array, got " + describe(node));
        }
        List<JsonCursor> out = new ArrayList<>(node.size());
        for (int i = 0; i < node.size(); i++) {
            out.add(new JsonCursor(node.get(i), path + "[" + i + "]", file));
        }
        return out;
    }

    public String text() throws CaseException {
        if (!node.isTextual()) {
            throw error("expected a string, got " + describe(node));
        }
        return node.textValue();
    }

    public String nonEmptyText() throws CaseException {
        String s = text();
        if (s.isBlank()) {
            throw error("must not be empty");
        }
        return s;
    }

    /** Whether the value is a JSON number (not a string, object or array). */
    public boolean isNumber() {
        return node.isNumber();
    }

    public boolean bool() throws CaseException {
        if (!node.isBoolean()) {
            throw error("expected true or false, got " + describe(node));
        }
        return node.booleanValue();
    }

    public double number() throws CaseException {
        if (!node.isNumber()) {
            throw error("expected a number, got " + describe(node));
        }
        double v = node.doubleValue();
        if (!Double.isFinite(v)) {
            throw error("the number " + abbreviate(node.asText()) + " is beyond the range of double precision"
                    + " (about ±1.8e308)");
        }
        return v;
    }

    /** A number in the range (docs/case-format.md, "Limits"). */
    public double within(Limits.Range r) throws CaseException {
        return inRange(number(), r);
    }

    /** A positive number in the range: a sign error is reported as such, then the range. */
    public double positiveWithin(Limits.Range r) throws CaseException {
        return inRange(positive(), r);
    }

    /** A number ≥ 0 in the range: a sign error is reported as such, then the range. */
    public double nonNegativeWithin(Limits.Range r) throws CaseException {
        return inRange(nonNegative(), r);
    }

    /** A whole number in the range. */
    public int wholeWithin(Limits.Range r) throws CaseException {
        if (!node.isIntegralNumber()) {
            throw error("expected a whole number " + r.describe() + ", got " + describe(node));
        }
        if (!node.canConvertToLong() || !r.contains(node.longValue())) {
            throw error("must lie " + r.describe() + " (see Limits in docs/case-format.md), got " + node.asText());
        }
        return (int) node.longValue();
    }

    /** The elements of an array, at most as many as the range allows. */
    public List<JsonCursor> elementsWithin(Limits.Range r) throws CaseException {
        if (node.isArray() && node.size() > r.max()) {
            throw error("has " + node.size() + " entries; at most " + Limits.number(r.max()) + " are allowed here"
                    + " (" + r.quantity() + ", see Limits in docs/case-format.md)");
        }
        return elements();
    }

    private double inRange(double v, Limits.Range r) throws CaseException {
        if (!r.contains(v)) {
            throw outOfRange(v, r);
        }
        return v;
    }

    /** The error for a value outside its range. */
    public CaseException outOfRange(double v, Limits.Range r) {
        return error("must lie " + r.describe() + " (see Limits in docs/case-format.md), got " + Limits.number(v)
                + (r.unit().isEmpty() ? "" : " " + r.unit()));
    }

    public double positive() throws CaseException {
        double v = number();
        if (!(v > 0)) {
            throw error("must be positive, got " + v);
        }
        return v;
    }

    public double nonNegative() throws CaseException {
        double v = number();
        if (v < 0) {
            throw error("must not be negative, got " + v);
        }
        return v;
    }

    public double fraction() throws CaseException {
        double v = number();
        if (v < 0 || v > 1) {
            throw error("must lie in [0, 1], got " + v);
        }
        return v;
    }

    public int positiveInt() throws CaseException {
        if (!node.isIntegralNumber() || !node.canConvertToInt() || node.intValue() < 1) {
            throw error("expected a positive whole number, got " + describe(node));
        }
        return node.intValue();
    }

    /** A non-empty array of numbers. */
    public double[] numbers() throws CaseException {
        List<JsonCursor> el = elements();
        double[] out = new double[el.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = el.get(i).number();
        }
        return out;
    }

    private static String describe(JsonNode n) {
        if (n.isTextual()) {
            return "the string \"" + abbreviate(n.textValue()) + "\"";
        }
        if (n.isNumber()) {
            return "the number " + n.asText();
        }
        if (n.isBoolean()) {
            return n.asText();
        }
        if (n.isNull()) {
            return "null";
        }
        if (n.isArray()) {
            return "an array";
        }
        return "an object";
    }

    private static String abbreviate(String s) {
        return s.length() > 40 ? s.substring(0, 37) + "..." : s;
    }
}
