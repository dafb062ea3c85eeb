package org.beamfolio.catalogue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.beamfolio.units.Suggest;

/**
 * The shape catalogue: the beam families of the AISC Shapes Database v15.0, looked up by
 * designation. A designation matches whatever its case, spaces or 'x'/'X', by its Manual label
 * ({@code W18X50}, {@code HSS10X6X3/16}), its EDI name ({@code HSS10X6X.188}) or its metric
 * designation ({@code W460X74}).
 */
public final class ShapeCatalogue {
    public static final String SOURCE = "AISC Shapes Database v15.0";
    static final String RESOURCE = "aisc-shapes-v15.0.csv";

    private static final Pattern NUMBER = Pattern.compile("\\d+(?:\\.\\d+)?(?:/\\d+)?|\\.\\d+");

    private final List<Shape> shapes;
    private final Map<String, Shape> byKey;
    /** Every name a shape answers to, with the way it is written, for suggestions. */
    private final List<Name> names;

    private record Name(String key, String written, Shape shape) {}

    private ShapeCatalogue(List<Shape> shapes) {
        this.shapes = List.copyOf(shapes);
        Map<String, Shape> keys = new HashMap<>();
        List<Name> all = new ArrayList<>();
        for (Shape s : shapes) {
            for (String written : new LinkedHashSet<>(List.of(s.designation(), s.ediName(), s.metricDesignation()))) {
                String key = normalise(written);
                if (keys.putIfAbsent(key, s) == null) {
                    // suggested as the Manual label, or the metric designation for a metric name
                    all.add(new Name(key, written.equals(s.metricDesignation()) ? written : s.designation(), s));
                }
            }
        }
        this.byKey = Collections.unmodifiableMap(keys);
        this.names = List.copyOf(all);
    }

    private static final class Holder {
        static final ShapeCatalogue AISC = load();
    }

    /** The AISC Shapes Database v15.0 catalogue, read once from the classpath. */
    public static ShapeCatalogue aisc() {
        return Holder.AISC;
    }

    /** The source and version every printed row names. */
    public String source() {
        return SOURCE;
    }

    public List<Shape> shapes() {
        return shapes;
    }

    public Optional<Shape> find(String designation) {
        return Optional.ofNullable(byKey.get(normalise(designation)));
    }

    /**
     * Up to {@code count} designations nearest to one that is not in the catalogue, written the
     * way the catalogue writes them (metric for a metric name): names of the same family with the
     * closest numbers (depth, weight, thickness) first, so W18X51 suggests W18X50, W18X55, W18X46;
     * a misspelt family falls back to the fewest edits.
     */
    public List<String> nearest(String designation, int count) {
        String key = normalise(designation);
        String family = prefix(key);
        double[] numbers = numbers(key);
        Map<Name, double[]> score = new HashMap<>();
        for (Name n : names) {
            boolean alike = prefix(n.key()).equals(family) && numbers(n.key()).length == numbers.length;
            int edits = Suggest.distance(key, n.key());
            score.put(n, new double[] {alike ? 0 : 1, alike ? numericGap(numbers, numbers(n.key())) : edits, edits});
        }
        List<Name> ranked = new ArrayList<>(names);
        ranked.sort(Comparator.<Name>comparingDouble(n -> score.get(n)[0])
                .thenComparingDouble(n -> score.get(n)[1])
                .thenComparingDouble(n -> score.get(n)[2])
                .thenComparing(Name::key));
        Set<String> out = new LinkedHashSet<>();
        for (Name n : ranked) {
            if (out.size() == count) {
                break;
            }
            out.add(n.written());
        }
        return List.copyOf(out);
    }

    /** The letters before the first digit or point: the family as written (W, HSS, PIPE, MC). */
    private static String prefix(String key) {
        int i = 0;
        while (i < key.length() && !Character.isDigit(key.charAt(i)) && key.charAt(i) != '.') {
            i++;
        }
        return key.substring(0, i);
    }

    /** Upper case, no spaces, '×' and 'x' as 'X': the form every name is indexed by. */
    static String normalise(String designation) {
        return designation.strip().toUpperCase(Locale.ROOT).replace('×', 'X').replaceAll("\\s+", "");
    }

    private static double[] numbers(String key) {
        Matcher m = NUMBER.matcher(key);
        List<Double> found = new ArrayList<>();
        while (m.find()) {
            String t = m.group();
            int slash = t.indexOf('/');
            found.add(slash < 0 ? Double.parseDouble(t)
                    : Double.parseDouble(t.substring(0, slash)) / Double.parseDouble(t.substring(slash + 1)));
        }
        return found.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** Sum of the relative differences of the numbers in turn (both have as many). */
    private static double numericGap(double[] a, double[] b) {
        double gap = 0;
        for (int i = 0; i < a.length; i++) {
            gap += Math.abs(a[i] - b[i]) / Math.max(Math.max(Math.abs(a[i]), Math.abs(b[i])), 1e-9);
        }
        return gap;
    }

    static ShapeCatalogue load() {
        try (InputStream in = ShapeCatalogue.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("the shape catalogue " + RESOURCE + " is missing from the classpath");
            }
            return read(new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8)));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static ShapeCatalogue read(BufferedReader reader) throws IOException {
        String[] header = null;
        List<Shape> shapes = new ArrayList<>();
        Map<String, ShapeProperty> byColumn = new HashMap<>();
        for (ShapeProperty p : ShapeProperty.values()) {
            byColumn.put(p.column(), p);
        }
        for (String line = reader.readLine(); line != null; line = reader.readLine()) {
            if (line.startsWith("#") || line.isBlank()) {
                continue;
            }
            String[] cells = line.split(",", -1);
            if (header == null) {
                header = cells;
                continue;
            }
            Map<String, String> row = new HashMap<>();
            Map<ShapeProperty, String> values = new EnumMap<>(ShapeProperty.class);
            for (int i = 0; i < header.length; i++) {
                row.put(header[i], cells[i]);
                ShapeProperty p = byColumn.get(header[i]);
                if (p != null && !cells[i].isEmpty()) {
                    values.put(p, cells[i]);
                }
            }
            ShapeFamily family = ShapeFamily.of(row.get("Type"), values.containsKey(ShapeProperty.OD));
            shapes.add(new Shape(row.get("AISC_Manual_Label"), row.get("EDI_Std_Nomenclature"),
                    row.get("AISC_Manual_Label_SI"), family, values));
        }
        return new ShapeCatalogue(shapes);
    }
}
