package org.beamfolio.job;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.beamfolio.combinations.BuiltInSets;
import org.beamfolio.model.timber.LoadDuration;
import org.beamfolio.model.timber.Temperature;
import org.beamfolio.model.timber.TimberKind;
import org.beamfolio.model.timber.TimberService;
import org.beamfolio.model.Beam;
import org.beamfolio.model.Material;
import org.beamfolio.model.Section;
import org.beamfolio.model.SectionShape;
import org.beamfolio.model.TimberDesign;
import org.beamfolio.units.Suggest;

/**
 * The timber part of the {@code design} block: {@code timber: NDS-2018}, {@code timber_service}
 * and {@code durations}, and whether the rest of the job allows NDS allowable stress design (a
 * timber material with a rectangular section on the beam, allowable-stress combinations).
 */
final class TimberDesignReader {
    static final List<String> STANDARDS = List.of("NDS-2018");
    static final List<String> TEMPERATURES = List.of("normal", "elevated", "high");

    /** The keys of {@code design.timber_service}. */
    static final Set<String> SERVICE_KEYS = Set.of("wet", "temperature", "repetitive", "incised");

    private TimberDesignReader() {}

    /** The timber design, or null when the job asks for none or something is wrong (then with its message). */
    /**
     * @param f the {@code design} mapping (its unknown keys are rejected once, by the job reader), or null
     */
    static TimberDesign read(ReadContext c, ReadContext.Fields f, Defined<String> cases, Map<String, Material> materials,
                             Map<String, Section> sections, Beam beam, YamlNode beamNode, String setName) {
        if (f == null) {
            return null;
        }
        YamlNode timberNode = f.optional("timber");
        YamlNode methodNode = f.optional("method");
        YamlNode serviceNode = f.optional("timber_service");
        YamlNode durationsNode = f.optional("durations");
        // the steel reader reads method and reports a bad value; here only whether it asks for LRFD
        String method = methodNode instanceof YamlNode.Scalar m ? m.text().strip().toUpperCase(Locale.ROOT) : null;
        if (timberNode == null) {
            for (YamlNode n : new YamlNode[] {serviceNode, durationsNode}) {
                if (n != null) {
                    c.error(n, n == serviceNode ? f.path("timber_service") : f.path("durations"),
                            "applies to timber design only: add design.timber: NDS-2018 (or remove it)");
                }
            }
            return null;
        }
        String standard = c.choice(timberNode, f.path("timber"), STANDARDS);
        boolean ok = standard != null;
        if ("LRFD".equals(method)) {
            c.error(methodNode, f.path("method"), "timber design here is NDS allowable stress design (ASD) only:"
                    + " set method: ASD or leave it out");
            ok = false;
        }
        if (BuiltInSets.ASCE7_LRFD.equals(setName) || BuiltInSets.EN1990.equals(setName)) {
            c.error(timberNode, f.path("timber"), "NDS allowable stress design compares stresses under allowable-stress"
                    + " combinations, and " + setName + " has none: use combinations: ASCE7-ASD or an explicit list");
            ok = false;
        }
        ok &= beamIsTimber(c, timberNode, f.path("timber"), materials, sections, beam);
        TimberService service = service(c, serviceNode, f.path("timber_service"));
        ok &= service != null;
        if (service != null && service.wet() && beam != null && usedMaterials(beam).stream().map(materials::get)
                .anyMatch(m -> m != null && m.timber() != null && m.timber().kind() == TimberKind.SCL)) {
            c.error(serviceNode, f.path("timber_service") + ".wet", "wet service of structural composite lumber is"
                    + " outside the NDS rules this tool applies: use the manufacturer's values for dry service");
            ok = false;
        }
        Set<String> given = new LinkedHashSet<>();
        Map<String, LoadDuration> durations = durations(c, durationsNode, f.path("durations"), cases, given, timberNode);
        ok &= durations != null;
        if (!ok || durations == null || beamNode == null) {
            return null;
        }
        return new TimberDesign(standard, service, durations, given, beamNode.location());
    }

    /** Every material the beam uses must be timber, on a rectangle: a timber check of steel is a mistake. */
    private static boolean beamIsTimber(ReadContext c, YamlNode at, String path, Map<String, Material> materials,
                                        Map<String, Section> sections, Beam beam) {
        if (beam == null) {
            return false;
        }
        boolean ok = true;
        for (String id : usedMaterials(beam)) {
            Material m = materials.get(id);
            if (m != null && m.timber() == null) {
                c.error(at, path, "timber design asked for, but material \"" + id + "\" of the beam has no timber reference"
                        + " values: give it timber: sawn | glulam | scl with Fb, Fv, Fc_perp, E and Emin, or remove design.timber");
                ok = false;
            }
        }
        Set<String> sectionIds = new LinkedHashSet<>();
        sectionIds.add(beam.section());
        beam.segments().forEach(s -> sectionIds.add(s.section()));
        for (String id : sectionIds) {
            Section s = sections.get(id);
            // a section to be chosen is refused by its own reader when its candidates are not lumber
            if (s != null && s.choice() == null && !(s.shape() instanceof SectionShape.Rectangle)) {
                c.error(at, path, "timber design needs a rectangular section, but section \"" + id + "\" is not one:"
                        + " use lumber: 2x10 (with plies) or shape: rectangle");
                ok = false;
            }
        }
        return ok;
    }

    static Set<String> usedMaterials(Beam beam) {
        Set<String> used = new LinkedHashSet<>();
        used.add(beam.material());
        beam.segments().forEach(s -> used.add(s.material()));
        return used;
    }

    private static TimberService service(ReadContext c, YamlNode node, String path) {
        if (node == null) {
            return TimberService.DEFAULT;
        }
        ReadContext.Fields f = c.fields(node, path);
        if (f == null) {
            return null;
        }
        Boolean wet = flag(c, f, "wet");
        Boolean repetitive = flag(c, f, "repetitive");
        Boolean incised = flag(c, f, "incised");
        YamlNode t = f.optional("temperature");
        String temperature = t == null ? "normal" : c.choice(t, f.path("temperature"), TEMPERATURES);
        f.rejectUnknown(SERVICE_KEYS);
        if (wet == null || repetitive == null || incised == null || temperature == null) {
            return null;
        }
        return new TimberService(wet, Temperature.valueOf(temperature.toUpperCase(Locale.ROOT)), repetitive, incised);
    }

    private static Boolean flag(ReadContext c, ReadContext.Fields f, String key) {
        YamlNode n = f.optional(key);
        return n == null ? Boolean.FALSE : c.bool(n, f.path(key));
    }

    /** The duration of every case used: as given, else the default of NDS Table 2.3.2 for its usual name. */
    private static Map<String, LoadDuration> durations(ReadContext c, YamlNode node, String path, Defined<String> cases,
                                                       Set<String> given, YamlNode fallback) {
        List<String> keys = new ArrayList<>();
        for (LoadDuration d : LoadDuration.values()) {
            keys.add(d.key());
        }
        Map<String, LoadDuration> stated = new LinkedHashMap<>();
        boolean ok = true;
        if (node != null) {
            ReadContext.Fields f = c.fields(node, path);
            if (f == null) {
                return null;
            }
            for (YamlNode.Entry e : f.node().entries().values()) {
                f.optional(e.key());
                if (!cases.has(e.key()) && !cases.failed(e.key())) {
                    String hint = Suggest.closest(e.key(), cases.ids()).map(s -> "; did you mean \"" + s + "\"?").orElse("");
                    c.error(e.keyLocation(), f.path(e.key()), "no load of this job has case \"" + e.key() + "\"" + hint
                            + " (cases: " + String.join(", ", cases.ids()) + ")");
                    ok = false;
                    continue;
                }
                String d = c.choice(e.value(), f.path(e.key()), keys);
                if (d == null) {
                    ok = false;
                } else {
                    stated.put(e.key(), LoadDuration.ofKey(d).orElseThrow());
                    given.add(e.key());
                }
            }
        }
        Map<String, LoadDuration> all = new LinkedHashMap<>();
        for (String loadCase : cases.ids()) {
            LoadDuration d = stated.getOrDefault(loadCase, LoadDuration.DEFAULTS.get(loadCase));
            if (d == null) {
                c.error(node != null ? node.location() : fallback.location(), path, "load case \"" + loadCase
                        + "\" needs a load duration for NDS design (no default for that name): add it, e.g. durations: { "
                        + loadCase + ": ten_years } (one of: " + String.join(", ", keys) + ")");
                ok = false;
            } else {
                all.put(loadCase, d);
            }
        }
        return ok ? all : null;
    }

    /**
     * Timber materials analysed with E' = E CM Ct Ci for the job's service conditions (NDS Table 4.3.1,
     * 5.3.1, 8.3.1), so deflections use the adjusted modulus.
     */
    static Map<String, Material> withAdjustedModulus(Map<String, Material> materials, TimberDesign design) {
        if (design == null) {
            return materials;
        }
        Map<String, Material> out = new LinkedHashMap<>();
        for (Map.Entry<String, Material> e : materials.entrySet()) {
            Material m = e.getValue();
            out.put(e.getKey(), m.timber() == null ? m : m.withModulus(m.timber().e()
                    * org.beamfolio.model.timber.ServiceFactors.modulusFactor(m.timber(), design.service())));
        }
        return out;
    }
}
