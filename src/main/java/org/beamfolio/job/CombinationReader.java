package org.beamfolio.job;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.beamfolio.combinations.BuiltInSets;
import org.beamfolio.combinations.CombinationSet;
import org.beamfolio.model.Beam;
import org.beamfolio.model.Combination;
import org.beamfolio.model.DeflectionLimit;
import org.beamfolio.model.Load;
import org.beamfolio.model.Location;
import org.beamfolio.units.Dimension;
import org.beamfolio.units.Suggest;

/** Reads what depends on the load cases: combinations, pattern loading and the checks. */
final class CombinationReader {
    /** The keys of the checks block: the reader rejects any other, and the JSON Schema is tested against them. */
    static final Set<String> CHECKS_KEYS = Set.of("stress", "deflection");

    /** The keys of one combination of an explicit list: the reader rejects any other, and the JSON Schema is tested against them. */
    static final Set<String> COMBINATION_KEYS = Set.of("name", "factors");

    /** The keys of one deflection limit under checks: the reader rejects any other, and the JSON Schema is tested against them. */
    static final Set<String> DEFLECTION_KEYS = Set.of("cases", "limit", "max", "relative");

    static final int MAX_COMBINATIONS = 500;
    private static final Pattern SPAN_RATIO = Pattern.compile("\\s*L\\s*/\\s*(\\d+(?:\\.\\d+)?)\\s*");

    private CombinationReader() {}

    record Outcome(String setName, List<Combination> combinations, List<String> pattern, boolean stressCheck,
                   List<DeflectionLimit> deflection) {}

    static Outcome read(ReadContext c, ReadContext.Fields top, Defined<String> cases, Beam beam) {
        Set<String> used = cases.ids();
        String setName = null;
        List<Combination> combinations = new ArrayList<>();
        YamlNode node = top.optional("combinations");
        if (node == null) {
            combinations.addAll(defaults(used));
        } else if (node instanceof YamlNode.Scalar) {
            setName = c.choice(node, "combinations", BuiltInSets.names());
            if (setName != null) {
                CombinationSet set = BuiltInSets.find(setName).orElseThrow();
                for (String loadCase : used) {
                    if (!set.cases().contains(loadCase)) {
                        c.error(node, "combinations", "loads of case \"" + loadCase + "\" appear in no combination of " + setName
                                + " (its cases: " + String.join(", ", new java.util.TreeSet<>(set.cases()))
                                + "): rename the case or give an explicit list of combinations");
                    }
                }
            }
        } else {
            explicit(c, node, cases, combinations);
        }
        List<String> pattern = pattern(c, top.optional("pattern"), cases, beam);
        boolean stress = false;
        List<DeflectionLimit> deflection = new ArrayList<>();
        YamlNode checks = top.optional("checks");
        if (checks != null) {
            ReadContext.Fields f = c.fields(checks, "checks");
            if (f != null) {
                YamlNode s = f.optional("stress");
                if (s != null) {
                    Boolean value = c.bool(s, f.path("stress"));
                    stress = value != null && value;
                }
                List<YamlNode> items = JobReader.listOrEmpty(c, f.optional("deflection"), f.path("deflection"));
                if (items != null) {
                    for (int i = 0; i < items.size(); i++) {
                        DeflectionLimit limit = deflectionLimit(c, items.get(i), f.path("deflection") + "[" + i + "]", cases);
                        if (limit != null) {
                            deflection.add(limit);
                        }
                    }
                }
                f.rejectUnknown(CHECKS_KEYS);
                if (stress && BuiltInSets.ASCE7_LRFD.equals(setName)) {
                    // factored strength combinations are not compared with allowable stresses
                    c.error(f.optional("stress"), f.path("stress"), "allowable-stress checks need allowable-stress or service combinations,"
                            + " and ASCE7-LRFD has none: use ASCE7-ASD, EN1990 or an explicit list, or set stress: false");
                }
            }
        }
        return new Outcome(setName, combinations, pattern, stress, deflection);
    }

    /** Without a combinations key: each case alone and, with more than one case, all of them together. */
    private static List<Combination> defaults(Set<String> used) {
        List<Combination> result = new ArrayList<>();
        Map<String, Double> all = new LinkedHashMap<>();
        for (String loadCase : used) {
            result.add(new Combination(loadCase, Map.of(loadCase, 1.0)));
            all.put(loadCase, 1.0);
        }
        if (used.size() > 1) {
            result.add(new Combination(String.join(" + ", used), all));
        }
        return result;
    }

    private static void explicit(ReadContext c, YamlNode node, Defined<String> cases, List<Combination> out) {
        List<YamlNode> items = c.list(node, "combinations").orElse(null);
        if (items == null) {
            return;
        }
        if (items.isEmpty()) {
            c.error(node, "combinations", "the list is empty: name a built-in set (" + String.join(", ", BuiltInSets.names())
                    + ") or list at least one combination");
        }
        if (items.size() > MAX_COMBINATIONS) {
            c.error(node, "combinations", "too many combinations: " + items.size() + " (at most " + MAX_COMBINATIONS + ")");
            return;
        }
        Set<String> names = new LinkedHashSet<>();
        for (int i = 0; i < items.size(); i++) {
            String path = "combinations[" + i + "]";
            ReadContext.Fields f = c.fields(items.get(i), path);
            if (f == null) {
                continue;
            }
            YamlNode nameNode = f.required("name");
            String name = nameNode == null ? null : c.id(nameNode, f.path("name"));
            if (name != null && !names.add(name)) {
                c.error(nameNode, f.path("name"), "two combinations are named \"" + name + "\"");
            }
            YamlNode factorsNode = f.required("factors");
            Map<String, Double> factors = new LinkedHashMap<>();
            ReadContext.Fields ff = factorsNode == null ? null : c.fields(factorsNode, f.path("factors"));
            if (ff != null) {
                if (ff.node().entries().isEmpty()) {
                    c.error(factorsNode, f.path("factors"), "no factors: give at least one case and its factor");
                }
                for (YamlNode.Entry entry : ff.node().entries().values()) {
                    ff.optional(entry.key());
                    if (!cases.has(entry.key())) {
                        unusedCase(c, entry.keyLocation(), ff.path(entry.key()), entry.key(), cases);
                        continue;
                    }
                    Double factor = c.number(entry.value(), ff.path(entry.key()));
                    if (factor != null) {
                        factors.put(entry.key(), factor);
                    }
                }
            }
            f.rejectUnknown(COMBINATION_KEYS);
            if (name != null && !factors.isEmpty()) {
                out.add(new Combination(name, factors));
            }
        }
    }

    /** A case no load uses, unless the loads that name it failed to read (they have their own messages). */
    private static void unusedCase(ReadContext c, Location at, String path, String loadCase, Defined<String> cases) {
        if (cases.failed(loadCase)) {
            return;
        }
        Set<String> used = cases.ids();
        String hint = Suggest.closest(loadCase, used).map(s -> "; did you mean \"" + s + "\"?").orElse("");
        c.error(at, path, "no load uses case \"" + loadCase + "\"" + hint
                + (used.isEmpty() ? "" : " (cases with loads: " + String.join(", ", used) + ")"));
    }

    private static List<String> pattern(ReadContext c, YamlNode node, Defined<String> cases, Beam beam) {
        List<String> result = new ArrayList<>();
        List<YamlNode> items = JobReader.listOrEmpty(c, node, "pattern");
        if (items == null) {
            return result;
        }
        for (int i = 0; i < items.size(); i++) {
            String id = c.id(items.get(i), "pattern[" + i + "]");
            if (id == null) {
                continue;
            }
            if (!cases.has(id)) {
                unusedCase(c, items.get(i).location(), "pattern[" + i + "]", id, cases);
            } else if (!result.contains(id)) {
                result.add(id);
            }
        }
        int regions = beam == null ? 0 : beam.regionBorders().size() - 1;
        if (!items.isEmpty() && beam != null && regions < 2) {
            c.error(node, "pattern", "pattern loading needs two or more regions (spans between supports, or overhangs);"
                    + " this beam has one (remove \"pattern\")");
        }
        return result;
    }

    private static DeflectionLimit deflectionLimit(ReadContext c, YamlNode node, String path, Defined<String> cases) {
        ReadContext.Fields f = c.fields(node, path);
        if (f == null) {
            return null;
        }
        List<String> named = new ArrayList<>();
        YamlNode casesNode = f.required("cases");
        List<YamlNode> items = casesNode == null ? null : c.list(casesNode, f.path("cases")).orElse(null);
        if (items != null) {
            if (items.isEmpty()) {
                c.error(casesNode, f.path("cases"), "name at least one load case");
            }
            for (int i = 0; i < items.size(); i++) {
                String id = c.id(items.get(i), f.path("cases") + "[" + i + "]");
                if (id != null && !cases.has(id)) {
                    unusedCase(c, items.get(i).location(), f.path("cases") + "[" + i + "]", id, cases);
                } else if (id != null) {
                    named.add(id);
                }
            }
        }
        YamlNode limitNode = f.optional("limit");
        YamlNode maxNode = f.optional("max");
        Double ratio = null;
        Double max = null;
        if ((limitNode == null) == (maxNode == null)) {
            c.error(node, path, "give either \"limit\" (a span ratio such as L/360) or \"max\" (a length such as 0.75 in), not "
                    + (limitNode == null ? "neither" : "both"));
        } else if (limitNode != null) {
            String text = c.text(limitNode, f.path("limit"));
            Matcher m = text == null ? null : SPAN_RATIO.matcher(text);
            if (m != null && m.matches() && Double.parseDouble(m.group(1)) > 0) {
                ratio = Double.parseDouble(m.group(1));
            } else if (text != null) {
                c.error(limitNode, f.path("limit"), "expected a span ratio such as L/360, got \"" + text + "\"");
            }
        } else {
            max = c.positive(maxNode, f.path("max"), Dimension.LENGTH);
        }
        YamlNode relativeNode = f.optional("relative");
        Boolean relative = relativeNode == null ? Boolean.TRUE : c.bool(relativeNode, f.path("relative"));
        f.rejectUnknown(DEFLECTION_KEYS);
        if (named.isEmpty() || (ratio == null && max == null) || relative == null) {
            return null;
        }
        return new DeflectionLimit(named, ratio, max, relative);
    }
}
