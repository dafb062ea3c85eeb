package org.beamfolio.job;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.beamfolio.catalogue.SteelGrade;
import org.beamfolio.model.Beam;
import org.beamfolio.model.Job;
import org.beamfolio.model.Load;
import org.beamfolio.model.Location;
import org.beamfolio.model.Material;
import org.beamfolio.model.Project;
import org.beamfolio.model.ProjectJob;
import org.beamfolio.model.ReportSettings;
import org.beamfolio.model.Section;
import org.beamfolio.model.TimberDesign;
import org.beamfolio.model.SteelDesign;
import org.beamfolio.units.Dimension;
import org.beamfolio.units.Lengths;
import org.beamfolio.units.UnitSystem;

/**
 * Reads a format 1 job file into a validated {@link Job}, or into the complete list of what is
 * wrong with it, each with its line, column and key path. Nothing here throws for bad input.
 */
public final class JobReader {
    /** Job files larger than this are refused before parsing. */
    public static final long MAX_FILE_BYTES = 4L * 1024 * 1024;

    /** The top-level keys of a job file. */
    static final Set<String> TOP_KEYS = Set.of("beamfolio", "project", "report", "materials", "sections", "beam", "area_loads", "loads", "cases", "combinations", "pattern", "checks", "design",
            "members");

    /** The keys of a steel or other non-timber material, {@code materials.<id>}. */
    static final Set<String> MATERIAL_KEYS = Set.of("grade", "E", "density", "allowable", "source", "Fy", "Fu");

    /** The keys of {@code materials.<id>.allowable}. */
    static final Set<String> ALLOWABLE_KEYS = Set.of("tension", "compression", "shear");

    /**
     * What any material may name: either kind's keys. Every material is asked whether it names
     * {@code timber}, and a timber material is asked for {@code allowable} only to refuse it.
     */
    private static final Set<String> ANY_MATERIAL_KEYS = union(MATERIAL_KEYS, TimberMaterialReader.KEYS);

    private JobReader() {}

    private static Set<String> union(Set<String> a, Set<String> b) {
        Set<String> all = new java.util.HashSet<>(a);
        all.addAll(b);
        return Set.copyOf(all);
    }

    public static JobReading read(Path file) {
        String label = file.toString();
        if (Files.isDirectory(file)) {
            return failed(label, null, "is a folder, not a job file");
        }
        try {
            long size = Files.size(file);
            if (size > MAX_FILE_BYTES) {
                return failed(label, null, "the file is " + size + " bytes; job files are limited to " + MAX_FILE_BYTES + " bytes");
            }
            return read(label, jobName(file), Files.readAllBytes(file));
        } catch (IOException e) {
            return failed(label, null, "cannot read the file: " + e.getMessage());
        }
    }

    /** The job's name: its file name without the .yaml or .yml ending. */
    public static String jobName(Path file) {
        String name = file.getFileName().toString();
        return name.replaceFirst("\\.(yaml|yml)$", "");
    }

    public static JobReading read(String label, String name, byte[] bytes) {
        String text;
        try {
            text = StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            // shown with the bad bytes replaced, so the offending line can still be printed
            String lossy = new String(bytes, StandardCharsets.UTF_8);
            return new JobReading(label, lossy, null, List.of(new Diagnostic(label, firstBadByte(bytes), "",
                    "the file is not UTF-8 text (save it as UTF-8)")));
        }
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1);
        }
        ReadContext context = new ReadContext(label);
        YamlNode root;
        try {
            root = new YamlTreeReader().read(text, context.diagnostics(), label);
        } catch (YamlTreeReader.SyntaxError e) {
            return new JobReading(label, text, null, List.of(new Diagnostic(label, e.location, "", e.getMessage())));
        }
        Object read = new JobReader.Walk(context, name, text, bytes).read(root);
        boolean clean = context.diagnostics().isEmpty();
        return new JobReading(label, text, clean && read instanceof Job job ? job : null,
                clean && read instanceof ProjectJob project ? project : null, context.diagnostics());
    }

    private static JobReading failed(String label, String source, String message) {
        return new JobReading(label, source, null, List.of(new Diagnostic(label, Location.START, "", message)));
    }

    private static Location firstBadByte(byte[] bytes) {
        int line = 1;
        int column = 1;
        var decoder = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT);
        for (int i = 0; i < bytes.length; ) {
            int b = bytes[i] & 0xff;
            int length = b < 0x80 ? 1 : b >= 0xf0 ? 4 : b >= 0xe0 ? 3 : b >= 0xc0 ? 2 : 1;
            try {
                decoder.reset().decode(ByteBuffer.wrap(bytes, i, Math.min(length, bytes.length - i)));
            } catch (CharacterCodingException e) {
                return new Location(line, column);
            }
            if (b == '\n') {
                line++;
                column = 1;
            } else {
                column++;
            }
            i += length;
        }
        return new Location(line, column);
    }

    public static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is part of every Java platform", e);
        }
    }

    /** One walk over the tree; each part of the file has its own reader. */
    private static final class Walk {
        private final ReadContext context;
        private final String name;
        private final String text;
        private final byte[] bytes;

        Walk(ReadContext context, String name, String text, byte[] bytes) {
            this.context = context;
            this.name = name;
            this.text = text;
            this.bytes = bytes;
        }

        /** The job the file holds: a single-beam {@link Job}, or a {@link ProjectJob} when it has members. */
        Object read(YamlNode root) {
            ReadContext.Fields top = context.fields(root, "");
            if (top == null) {
                return null;
            }
            if (top.has("members")) {
                return new MembersReader(context, this::member).read(top, name, text, bytes, sha256(bytes));
            }
            return job(root, top, null, null, null);
        }

        /** One member of a job with members, read as a single-beam job from its own keys over the shared ones. */
        private Job member(ReadContext.Fields fields, String id, Defined<LoadReader.Supporting> supporting,
                           Map<String, java.util.Set<String>> memberCases) {
            return job(fields.node(), fields, id, supporting, memberCases);
        }

        /**
         * @param member the member's id, or null for a single-beam job
         * @param supporting the members whose reactions this one may carry, or null for a single-beam job
         * @param memberCases their load cases
         */
        private Job job(YamlNode root, ReadContext.Fields top, String member, Defined<LoadReader.Supporting> supporting,
                        Map<String, java.util.Set<String>> memberCases) {
            YamlNode version = top.required("beamfolio");
            if (version != null && !(version instanceof YamlNode.Scalar s && s.text().equals("1"))) {
                context.error(version, "beamfolio", "unsupported format version: this tool reads format 1 (write \"beamfolio: 1\")");
            }
            Project project = ProjectReader.read(context, top.required("project"));
            ReportSettings report = ProjectReader.report(context, top.optional("report"), JobUnits.of(top.optional("beam")));
            context.writeLengthsAs(report.units() == UnitSystem.SI ? Lengths.Style.METRES : Lengths.Style.FEET_AND_INCHES);
            YamlNode materialsNode = top.required("materials");
            Map<String, Material> materials = materials(materialsNode);
            YamlNode sectionsNode = top.required("sections");
            Map<String, Section> sections = SectionReader.readAll(context, sectionsNode);
            YamlNode beamNode = top.required("beam");
            Beam beam = BeamReader.read(context, beamNode, top.path("beam"), Defined.keysOf(materialsNode, materials),
                    Defined.keysOf(sectionsNode, sections));
            Defined<org.beamfolio.loads.AreaLoad> areaLoads = AreaLoadReader.readAll(context, top.optional("area_loads"));
            YamlNode designNode = top.optional("design");
            ReadContext.Fields design = designNode == null ? null : context.fields(designNode, top.path("design"));
            org.beamfolio.loads.ReductionSettings reductions = designNode != null && design == null ? null
                    : DesignReader.reductions(context, design);
            LoadReader.Read read = LoadReader.readAll(context, top.optional("loads"), top.path("loads"), beam, areaLoads,
                    reductions, supporting);
            List<Load> loads = read.loads();
            Map<String, String> cases = cases(top.optional("cases"));
            if (loads.isEmpty() && read.reactions().isEmpty() && (beam == null || beam.selfWeightCase() == null)
                    && context.diagnostics().isEmpty()) {
                YamlNode at = top.optional("loads");
                context.error(at != null ? at.location() : root.location(), top.path("loads"),
                        "the " + (member == null ? "job" : "member") + " has no loads: add at least one load (or beam.self_weight)"
                                + " for there to be anything to check");
            }
            Defined<String> loadCases = LoadCases.of(loads, beam, beamNode, top.optional("loads"), areaLoads, memberCases);
            CombinationReader.Outcome combos = CombinationReader.read(context, top, loadCases, beam);
            TimberDesign timber = TimberDesignReader.read(context, design, loadCases, materials, sections, beam,
                    beamNode, combos == null ? null : combos.setName());
            materials = TimberDesignReader.withAdjustedModulus(materials, timber);
            if (combos != null && combos.stressCheck() && beam != null) {
                requireAllowables(top, materials, beam);
            }
            SteelDesign steel = SteelDesignReader.read(context, design, combos == null ? null : combos.setName(), beam,
                    materials, sections, sectionsNode, materialsNode);
            if (beam != null) {
                ChoiceReader.requireFit(context, beam, materials, sections, sectionsNode, steel != null || timber != null
                        || (design != null && (design.has("steel") || design.has("timber")))
                        || (combos != null && (combos.stressCheck() || !combos.deflection().isEmpty())));
            }
            if (design != null) {
                design.rejectUnknown(DesignReader.DESIGN_KEYS);
            }
            top.rejectUnknown(TOP_KEYS);
            if (!context.diagnostics().isEmpty() || project == null || beam == null || combos == null) {
                return null;
            }
            return new Job(name, text, sha256(bytes), project, report, materials, sections, beam, loads, cases,
                    combos.setName(), combos.combinations(), combos.pattern(), combos.stressCheck(), combos.deflection(), bytes,
                    read.takeOff(), steel, timber, member, read.reactions());
        }

        /** A stress check compares with the allowables, so every material on the beam must give them. */
        private void requireAllowables(ReadContext.Fields top, Map<String, Material> materials, Beam beam) {
            java.util.Set<String> used = new java.util.LinkedHashSet<>();
            used.add(beam.material());
            beam.segments().forEach(s -> used.add(s.material()));
            YamlNode checks = top.optional("checks");
            for (String id : used) {
                Material m = materials.get(id);
                if (m == null) {
                    continue;
                }
                YamlNode at = checks instanceof YamlNode.Mapping map && map.entries().containsKey("stress")
                        ? map.entries().get("stress").value() : checks;
                if (m.timber() != null) {
                    context.error(at, "checks.stress", "material \"" + id + "\" is timber: it is checked to the NDS with"
                            + " design.timber: NDS-2018, not against allowables; set stress: false");
                    continue;
                }
                List<String> missing = new ArrayList<>();
                if (m.allowableTension() == null) {
                    missing.add("tension");
                }
                if (m.allowableCompression() == null) {
                    missing.add("compression");
                }
                if (m.allowableShear() == null) {
                    missing.add("shear");
                }
                if (!missing.isEmpty()) {
                    context.error(at, "checks.stress", "the stress check needs allowable " + String.join(", ", missing)
                            + " stress for material \"" + id + "\" (add materials." + id + ".allowable)");
                }
            }
        }

        private Map<String, Material> materials(YamlNode node) {
            Map<String, Material> result = new LinkedHashMap<>();
            if (node == null) {
                return result;
            }
            ReadContext.Fields all = context.fields(node, "materials");
            if (all == null) {
                return result;
            }
            if (all.node().entries().isEmpty()) {
                context.error(node, "materials", "at least one material is needed");
            }
            for (YamlNode.Entry entry : all.node().entries().values()) {
                all.optional(entry.key());
                String path = "materials." + entry.key();
                ReadContext.Fields f = context.fields(entry.value(), path);
                if (f == null) {
                    continue;
                }
                if (f.has("timber")) {
                    Material timber = TimberMaterialReader.read(context, f, entry.key());
                    f.rejectUnknown(ANY_MATERIAL_KEYS);
                    if (timber != null) {
                        result.put(entry.key(), timber);
                    }
                    continue;
                }
                YamlNode gradeNode = f.optional("grade");
                SteelGrade grade = gradeNode == null ? null : CatalogueSections.grade(context, gradeNode, f.path("grade"));
                if (gradeNode != null && grade == null) {
                    f.rejectUnknown(ANY_MATERIAL_KEYS, "E", "density", "allowable", "source", "Fy", "Fu");
                    continue;
                }
                Double e = grade == null ? req(f, "E", Dimension.STRESS) : opt(f, "E", Dimension.STRESS);
                Double density = opt(f, "density", Dimension.WEIGHT_DENSITY);
                Double fy = opt(f, "Fy", Dimension.STRESS);
                Double fu = opt(f, "Fu", Dimension.STRESS);
                if (grade != null) {
                    e = e == null ? grade.elasticModulus() : e;
                    density = density == null ? grade.weightDensity() : density;
                }
                if (fy != null && fu != null && fu < fy) {
                    context.error(f.optional("Fu"), f.path("Fu"), "Fu must not be less than Fy");
                }
                Double tension = null;
                Double compression = null;
                Double shear = null;
                YamlNode allowable = f.optional("allowable");
                if (allowable != null) {
                    ReadContext.Fields a = context.fields(allowable, f.path("allowable"));
                    if (a != null) {
                        tension = opt(a, "tension", Dimension.STRESS);
                        compression = opt(a, "compression", Dimension.STRESS);
                        shear = opt(a, "shear", Dimension.STRESS);
                        a.rejectUnknown(ALLOWABLE_KEYS);
                    }
                }
                YamlNode source = f.optional("source");
                String sourceText = source == null ? (grade == null ? "" : grade.standard())
                        : context.text(source, f.path("source"));
                f.rejectUnknown(ANY_MATERIAL_KEYS);
                if (e != null) {
                    result.put(entry.key(), new Material(entry.key(), e, density, tension, compression, shear,
                            sourceText == null ? "" : sourceText, grade == null ? null : grade.label(), fy, fu));
                }
            }
            return result;
        }

        private Double req(ReadContext.Fields f, String key, Dimension dimension) {
            YamlNode node = f.required(key);
            return node == null ? null : context.positive(node, f.path(key), dimension);
        }

        private Double opt(ReadContext.Fields f, String key, Dimension dimension) {
            YamlNode node = f.optional(key);
            return node == null ? null : context.positive(node, f.path(key), dimension);
        }

        private Map<String, String> cases(YamlNode node) {
            Map<String, String> result = new LinkedHashMap<>();
            if (node == null) {
                return result;
            }
            ReadContext.Fields f = context.fields(node, "cases");
            if (f == null) {
                return result;
            }
            for (YamlNode.Entry entry : f.node().entries().values()) {
                f.optional(entry.key());
                String description = context.text(entry.value(), f.path(entry.key()));
                if (description != null) {
                    result.put(entry.key(), description);
                }
            }
            return result;
        }
    }

    /** The list form of an optional sequence: empty when absent, null when not a list. */
    static List<YamlNode> listOrEmpty(ReadContext context, YamlNode node, String path) {
        if (node == null) {
            return new ArrayList<>();
        }
        return context.list(node, path).orElse(null);
    }
}
