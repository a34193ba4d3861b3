package org.exitance.fuzz;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Random;

/**
 * Mutations of a case's JSON tree, drawn from a seeded {@link Random}: numbers to extremes (huge,
 * tiny, negative, zero, −0, 1e308, and beyond double range), keys removed and renamed, arrays
 * emptied and resized, types swapped, strings emptied or swapped with other names of the case.
 * Division counts get their own values so that a mutant stays cheap to solve or is refused by the
 * limits. Each mutation appends a one-line description to the log, for the failure report.
 */
final class JsonMutator {
    private static final JsonNodeFactory F = JsonNodeFactory.instance;
    private static final double[] EXTREMES = {0.0, -0.0, -1.0, 1.0, 2.0, 0.5, 1e308, -1e308, 1e-308, 4.9e-324, 1e300,
        -1e300, 1e-300, 1e30, 1e20, -1e20, 1e12, 1e9, 1e6, 1e-6, 1e-9, 1e-12, 1e-15, 0.01, 273.15, 1e4, 1e5, 3.0e3};
    private static final String[] DIVISIONS = {"0", "-1", "1", "2", "3", "4", "100000", "1000000000", "2.5", "1e308",
        "20000"};

    /** A place in the tree: the container, and the key or index of the value there. */
    private record Slot(JsonNode parent, String key, int index, JsonNode value, String path) {
        void set(JsonNode v) {
            if (parent instanceof ObjectNode o) {
                o.set(key, v);
            } else {
                ((ArrayNode) parent).set(index, v);
            }
        }
    }

    private final Random random;
    private final List<String> log;

    JsonMutator(Random random, List<String> log) {
        this.random = random;
        this.log = log;
    }

    /** Applies one mutation to the tree (modified). */
    void mutate(ObjectNode root) {
        List<Slot> slots = new ArrayList<>();
        collect(root, "$", slots);
        if (slots.isEmpty()) {
            return;
        }
        Slot s = slots.get(random.nextInt(slots.size()));
        JsonNode v = s.value();
        int dice = random.nextInt(100);
        if (v.isNumber() && s.path().contains("divisions")) {
            String d = DIVISIONS[random.nextInt(DIVISIONS.length)];
            s.set(number(d));
            log.add(s.path() + " = " + d);
        } else if (v.isNumber() && dice < 70) {
            numberMutation(s);
        } else if (dice < 12) {
            swapType(s);
        } else if (dice < 30 && s.parent() instanceof ObjectNode o) {
            if (random.nextBoolean()) {
                o.remove(s.key());
                log.add("removed " + s.path());
            } else {
                rename(o, s);
            }
        } else if (v.isArray()) {
            arrayMutation(s, (ArrayNode) v);
        } else if (v.isObject() && ((ObjectNode) v).size() > 0) {
            objectMutation(s, (ObjectNode) v, slots);
        } else if (v.isTextual()) {
            textMutation(s, slots);
        } else if (s.parent() instanceof ArrayNode a && dice < 60) {
            a.remove(s.index());
            log.add("removed " + s.path());
        } else {
            swapType(s);
        }
    }

    private static void collect(JsonNode n, String path, List<Slot> out) {
        if (n instanceof ObjectNode o) {
            Iterator<String> it = o.fieldNames();
            while (it.hasNext()) {
                String k = it.next();
                JsonNode v = o.get(k);
                String p = path + "." + k;
                out.add(new Slot(o, k, -1, v, p));
                collect(v, p, out);
            }
        } else if (n instanceof ArrayNode a) {
            for (int i = 0; i < a.size(); i++) {
                String p = path + "[" + i + "]";
                out.add(new Slot(a, null, i, a.get(i), p));
                collect(a.get(i), p, out);
            }
        }
    }

    private void numberMutation(Slot s) {
        double old = s.value().doubleValue();
        int kind = random.nextInt(6);
        JsonNode v;
        String what;
        switch (kind) {
            case 0, 1 -> {
                double x = EXTREMES[random.nextInt(EXTREMES.length)];
                v = F.numberNode(x);
                what = Double.toString(x);
            }
            case 2 -> {
                double x = old * Math.pow(10, random.nextInt(25) - 12);
                v = F.numberNode(x);
                what = Double.toString(x);
            }
            case 3 -> {
                v = F.numberNode(-old);
                what = Double.toString(-old);
            }
            case 4 -> {
                String[] big = {"1e400", "-1e400", "123456789012345678901234567890", "2147483648", "-2147483649"};
                String x = big[random.nextInt(big.length)];
                v = number(x);
                what = x;
            }
            default -> {
                double x = old * (1 + (random.nextDouble() - 0.5) * 0.2);
                v = F.numberNode(x);
                what = Double.toString(x);
            }
        }
        s.set(v);
        log.add(s.path() + " = " + what);
    }

    /** A number node as JSON would read the text (big values stay big; beyond double range stays text). */
    private static JsonNode number(String text) {
        if (text.matches("-?\\d+")) {
            BigInteger b = new BigInteger(text);
            return b.bitLength() < 32 ? F.numberNode(b.intValue()) : F.numberNode(b);
        }
        return F.numberNode(new java.math.BigDecimal(text));
    }

    private void swapType(Slot s) {
        JsonNode[] options = {F.textNode("x"), F.booleanNode(true), F.nullNode(), F.objectNode(), F.arrayNode(),
            F.numberNode(1), F.textNode(""), F.numberNode(-1.5), F.arrayNode().add(1).add(2).add(3)};
        JsonNode v = options[random.nextInt(options.length)];
        s.set(v);
        log.add(s.path() + " = " + v);
    }

    private void rename(ObjectNode o, Slot s) {
        String k = s.key();
        String[] names = {k + "x", k.replaceAll("_[A-Za-z0-9]+$", ""), k.toUpperCase(java.util.Locale.ROOT),
            k.endsWith("_K") ? k.substring(0, k.length() - 2) + "_C" : k + "_K", "", "surfaces", "temperature_K",
            "netHeat_W", "adiabatic", "environment"};
        String to = names[random.nextInt(names.length)];
        JsonNode v = o.remove(k);
        o.set(to, v);
        log.add("renamed " + s.path() + " to '" + to + "'");
    }

    private void arrayMutation(Slot s, ArrayNode a) {
        int kind = random.nextInt(6);
        if (kind == 0 || a.isEmpty()) {
            a.removeAll();
            log.add("emptied " + s.path());
        } else if (kind == 1) {
            a.remove(a.size() - 1);
            log.add("dropped the last entry of " + s.path());
        } else if (kind == 2) {
            a.add(a.get(random.nextInt(a.size())).deepCopy());
            log.add("appended a copy of an entry to " + s.path());
        } else if (kind == 3) {
            a.insert(0, a.get(a.size() - 1).deepCopy());
            log.add("prepended a copy of the last entry to " + s.path());
        } else if (kind == 4) {
            List<JsonNode> rev = new ArrayList<>();
            a.forEach(rev::add);
            a.removeAll();
            for (int i = rev.size() - 1; i >= 0; i--) {
                a.add(rev.get(i));
            }
            log.add("reversed " + s.path());
        } else {
            a.add(EXTREMES[random.nextInt(EXTREMES.length)]);
            log.add("appended a number to " + s.path());
        }
    }

    private void objectMutation(Slot s, ObjectNode o, List<Slot> slots) {
        int kind = random.nextInt(4);
        List<String> keys = new ArrayList<>();
        o.fieldNames().forEachRemaining(keys::add);
        if (kind == 0) {
            String k = keys.get(random.nextInt(keys.size()));
            o.remove(k);
            log.add("removed " + s.path() + "." + k);
        } else if (kind == 1) {
            o.put("unexpected", 1);
            log.add("added " + s.path() + ".unexpected");
        } else if (kind == 2) {
            o.removeAll();
            log.add("emptied " + s.path());
        } else {
            Slot other = slots.get(random.nextInt(slots.size()));
            String k = keys.get(random.nextInt(keys.size()));
            o.set(k, other.value().deepCopy());
            log.add(s.path() + "." + k + " = copy of " + other.path());
        }
    }

    private void textMutation(Slot s, List<Slot> slots) {
        int kind = random.nextInt(5);
        String to;
        if (kind == 0) {
            to = "";
        } else if (kind == 1) {
            to = "-";
        } else if (kind == 2) {
            to = "x".repeat(500);
        } else {
            List<String> texts = new ArrayList<>();
            for (Slot x : slots) {
                if (x.value().isTextual() && x.value().textValue().length() < 60) {
                    texts.add(x.value().textValue());
                }
            }
            to = texts.isEmpty() ? "y" : texts.get(random.nextInt(texts.size()));
        }
        s.set(F.textNode(to));
        log.add(s.path() + " = \"" + (to.length() > 40 ? to.substring(0, 40) + "..." : to) + "\"");
    }

    /** A mutation of the file's text: cut short, a token JSON does not allow, trailing content. */
    String mutateText(String text) {
        int kind = random.nextInt(6);
        switch (kind) {
            case 0: {
                int at = random.nextInt(Math.max(1, text.length()));
                log.add("cut the file short at character " + at);
                return text.substring(0, at);
            }
            case 1: {
                String[] tokens = {"NaN", "Infinity", "-Infinity", "1e400", "-0", "01", "+1", ".5", "1e", "tru", "0x10"};
                String t = tokens[random.nextInt(tokens.length)];
                java.util.regex.Matcher m = java.util.regex.Pattern.compile("(?<=: )-?\\d[0-9.eE+-]*").matcher(text);
                List<int[]> spans = new ArrayList<>();
                while (m.find()) {
                    spans.add(new int[] {m.start(), m.end()});
                }
                if (spans.isEmpty()) {
                    return text;
                }
                int[] sp = spans.get(random.nextInt(spans.size()));
                log.add("replaced the number at character " + sp[0] + " by the token " + t);
                return text.substring(0, sp[0]) + t + text.substring(sp[1]);
            }
            case 2:
                log.add("appended trailing content");
                return text + "\n{}";
            case 3: {
                int at = text.indexOf('{', 1);
                log.add("inserted a comment");
                return at < 0 ? text : text.substring(0, at) + "/* c */" + text.substring(at);
            }
            case 4: {
                int at = text.indexOf("\"name\"");
                log.add("duplicated the first \"name\" key");
                return at < 0 ? text : text.substring(0, at) + "\"name\": \"dup\", " + text.substring(at);
            }
            default:
                log.add("added a trailing comma");
                return text.replaceFirst("\\]", ",]");
        }
    }
}
