package org.beamfolio.model;

import java.util.List;
import java.util.Map;

/**
 * A validated job: everything format 1 says, in SI units, ready for analysis.
 *
 * @param combinationSet the built-in set's name, or null for an explicit list
 * @param combinations the combinations the job states (a built-in set is expanded by the analysis)
 * @param sourceBytes the job file exactly as read, for the package's attachment
 * @param takeOff where the line loads that came from area loads came from, and the live load
 *        reductions taken (those line loads are already in {@code loads}, reduced)
 * @param steelDesign steel design to AISC 360 ({@code design.steel}), or null when the job asks for none
 * @param timber timber design to the NDS ({@code design.timber}), or null when the job asks for none
 * @param member the member's id in a job with {@code members}, or null for a single-beam job
 * @param reactionLoads reactions of other members this member carries (empty for a single-beam
 *        job): as read, to be brought into {@code loads} once those members are solved; after that,
 *        the record of where those loads came from
 */
public record Job(String name, String sourceText, String sha256, Project project, ReportSettings report,
                  Map<String, Material> materials, Map<String, Section> sections, Beam beam,
                  List<Load> loads, Map<String, String> cases, String combinationSet,
                  List<Combination> combinations, List<String> pattern, boolean stressCheck,
                  List<DeflectionLimit> deflectionLimits, byte[] sourceBytes,
                  org.beamfolio.loads.TakeOff takeOff, SteelDesign steelDesign, TimberDesign timber,
                  String member, List<ReactionLoad> reactionLoads) {
    /** A single-beam job. */
    public Job(String name, String sourceText, String sha256, Project project, ReportSettings report,
               Map<String, Material> materials, Map<String, Section> sections, Beam beam,
               List<Load> loads, Map<String, String> cases, String combinationSet,
               List<Combination> combinations, List<String> pattern, boolean stressCheck,
               List<DeflectionLimit> deflectionLimits, byte[] sourceBytes,
               org.beamfolio.loads.TakeOff takeOff, SteelDesign steelDesign, TimberDesign timber) {
        this(name, sourceText, sha256, project, report, materials, sections, beam, loads, cases, combinationSet,
                combinations, pattern, stressCheck, deflectionLimits, sourceBytes, takeOff, steelDesign, timber, null, List.of());
    }

    /** A job of line loads only. */
    public Job(String name, String sourceText, String sha256, Project project, ReportSettings report,
               Map<String, Material> materials, Map<String, Section> sections, Beam beam,
               List<Load> loads, Map<String, String> cases, String combinationSet,
               List<Combination> combinations, List<String> pattern, boolean stressCheck,
               List<DeflectionLimit> deflectionLimits, byte[] sourceBytes) {
        this(name, sourceText, sha256, project, report, materials, sections, beam, loads, cases, combinationSet,
                combinations, pattern, stressCheck, deflectionLimits, sourceBytes, org.beamfolio.loads.TakeOff.EMPTY, null, null);
    }

    /** A job without timber design. */
    public Job(String name, String sourceText, String sha256, Project project, ReportSettings report,
               Map<String, Material> materials, Map<String, Section> sections, Beam beam,
               List<Load> loads, Map<String, String> cases, String combinationSet,
               List<Combination> combinations, List<String> pattern, boolean stressCheck,
               List<DeflectionLimit> deflectionLimits, byte[] sourceBytes,
               org.beamfolio.loads.TakeOff takeOff, SteelDesign steelDesign) {
        this(name, sourceText, sha256, project, report, materials, sections, beam, loads, cases, combinationSet,
                combinations, pattern, stressCheck, deflectionLimits, sourceBytes, takeOff, steelDesign, null);
    }

    public Job {
        java.util.Objects.requireNonNull(takeOff, "takeOff");
        sourceBytes = sourceBytes.clone();
        materials = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(materials));
        sections = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(sections));
        loads = List.copyOf(loads);
        cases = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(cases));
        combinations = List.copyOf(combinations);
        pattern = List.copyOf(pattern);
        deflectionLimits = List.copyOf(deflectionLimits);
        reactionLoads = List.copyOf(reactionLoads);
    }

    /** The same job with these loads (the reactions it carries brought in, or loads reduced for a check). */
    public Job withLoads(List<Load> newLoads) {
        return new Job(name, sourceText, sha256, project, report, materials, sections, beam, newLoads, cases, combinationSet,
                combinations, pattern, stressCheck, deflectionLimits, sourceBytes, takeOff, steelDesign, timber, member,
                reactionLoads);
    }

    @Override
    public byte[] sourceBytes() {
        return sourceBytes.clone();
    }
}
