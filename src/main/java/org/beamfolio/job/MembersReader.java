package org.beamfolio.job;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.beamfolio.model.Job;
import org.beamfolio.model.Load;
import org.beamfolio.model.ProjectJob;
import org.beamfolio.model.ReactionLoad;

/**
 * Reads a job with {@code members}: each member is read as a single-beam job would be, from its
 * own keys over the shared ones, in dependency order (a member after every member whose reactions
 * it carries), so that a reaction load can be checked against the supports and cases of the
 * member it comes from. A reaction from a member that does not exist, and members that carry
 * each other's reactions in a cycle, are bad input.
 */
final class MembersReader {
    /** The keys a member may give: its id, its own beam and loads, and the shared settings it overrides. */
    static final Set<String> MEMBER_KEYS = Set.of("id", "beam", "loads", "design", "combinations", "pattern", "checks", "cases");

    /** The keys only a member gives in a job with members. */
    private static final List<String> OWN_ONLY = List.of("beam", "loads");

    static final int MAX_MEMBERS = 500;

    /** Reads one member from its merged keys. */
    interface MemberRead {
        Job read(ReadContext.Fields fields, String id, Defined<LoadReader.Supporting> supporting, Map<String, Set<String>> cases);
    }

    private final ReadContext context;
    private final MemberRead memberRead;

    MembersReader(ReadContext context, MemberRead memberRead) {
        this.context = context;
        this.memberRead = memberRead;
    }

    /** One member as written: its id, its mapping, its key path, and the members whose reactions it carries. */
    private record Written(String id, YamlNode.Mapping node, String path, Map<String, YamlNode> carries) {}

    ProjectJob read(ReadContext.Fields top, String name, String text, byte[] bytes, String sha256) {
        for (String key : OWN_ONLY) {
            if (top.has(key)) {
                context.error(top.node().entries().get(key).keyLocation(), key, "a job with members gives each member its own "
                        + key + " (under members[..]." + key + "); move it into a member");
            }
        }
        YamlNode membersNode = top.optional("members");
        List<YamlNode> items = context.list(membersNode, "members").orElse(List.of());
        if (items.isEmpty() && membersNode instanceof YamlNode.Sequence) {
            context.error(membersNode, "members", "the list is empty: give at least one member (id, beam, loads)");
        }
        if (items.size() > MAX_MEMBERS) {
            context.error(membersNode, "members", "too many members: " + items.size() + " (at most " + MAX_MEMBERS + ")");
            return null;
        }
        List<Written> written = written(items);
        Map<String, Written> byId = new LinkedHashMap<>();
        written.forEach(w -> byId.putIfAbsent(w.id(), w));
        List<Written> order = dependencyOrder(written, byId);
        Map<String, YamlNode.Entry> sharedEntries = new LinkedHashMap<>(top.node().entries());
        sharedEntries.keySet().removeAll(List.of("members", "beam", "loads"));
        YamlNode.Mapping shared = new YamlNode.Mapping(top.node().location(), sharedEntries);
        Map<String, LoadReader.Supporting> supporting = new LinkedHashMap<>();
        Map<String, Set<String>> cases = new LinkedHashMap<>();
        Map<String, Job> read = new LinkedHashMap<>();
        for (Written w : order) {
            Map<String, YamlNode.Entry> own = new LinkedHashMap<>(w.node().entries());
            own.remove("id");
            for (YamlNode.Entry e : own.values()) {
                if (!MEMBER_KEYS.contains(e.key())) {
                    context.error(e.keyLocation(), w.path() + "." + e.key(), sharedOnly(e.key()));
                }
            }
            own.keySet().retainAll(MEMBER_KEYS);
            ReadContext.Fields fields = context.member(shared, new YamlNode.Mapping(w.node().location(), own), w.path());
            Defined<LoadReader.Supporting> sources = new Defined<>(supporting, byId.keySet(), true);
            Job job = memberRead.read(fields, w.id(), sources, cases);
            if (job != null) {
                read.put(w.id(), job);
                supporting.put(w.id(), new LoadReader.Supporting(w.id(), job.beam().supports().size()));
                cases.put(w.id(), casesOf(job, cases));
            }
        }
        if (!context.diagnostics().isEmpty() || read.size() != written.size()) {
            return null;
        }
        return new ProjectJob(name, text, sha256, bytes, written.stream().map(w -> read.get(w.id())).toList(),
                order.stream().map(Written::id).toList());
    }

    private static String sharedOnly(String key) {
        String allowed = " (a member gives only " + String.join(", ", new java.util.TreeSet<>(MEMBER_KEYS)) + ")";
        if (JobReader.TOP_KEYS.contains(key)) {
            return "\"" + key + "\" is shared by every member: write it at the top of the file" + allowed;
        }
        String hint = org.beamfolio.units.Suggest.closest(key, MEMBER_KEYS).map(s -> "; did you mean \"" + s + "\"?").orElse("");
        return "unknown key" + hint + allowed;
    }

    /** Every load case a member's analysis has: its own loads', its self weight's and those of the reactions it carries. */
    private static Set<String> casesOf(Job job, Map<String, Set<String>> carried) {
        Set<String> result = new LinkedHashSet<>();
        job.loads().stream().map(Load::loadCase).forEach(result::add);
        if (job.beam().selfWeightCase() != null) {
            result.add(job.beam().selfWeightCase());
        }
        for (ReactionLoad r : job.reactionLoads()) {
            result.addAll(carried.getOrDefault(r.member(), Set.of()));
        }
        return result;
    }

    /** The members as written, with their ids checked and the reactions each one carries found. */
    private List<Written> written(List<YamlNode> items) {
        List<Written> result = new ArrayList<>();
        Map<String, YamlNode> seen = new LinkedHashMap<>();
        for (int i = 0; i < items.size(); i++) {
            String path = "members[" + i + "]";
            ReadContext.Fields f = context.fields(items.get(i), path);
            if (f == null) {
                continue;
            }
            YamlNode idNode = f.required("id");
            String id = idNode == null ? null : context.id(idNode, f.path("id"));
            if (id == null) {
                continue;
            }
            if (!id.matches("[A-Za-z0-9][A-Za-z0-9._-]*")) {
                // the id names the member's sheets, anchors and CSV file
                context.error(idNode, f.path("id"), "a member id is letters, digits, '.', '-' and '_' (like J-1 or B2.1),"
                        + " starting with a letter or digit; got \"" + id + "\"");
                continue;
            }
            if (seen.containsKey(id)) {
                context.error(idNode, f.path("id"), "member \"" + id + "\" is given twice (first at line "
                        + seen.get(id).location().line() + "): each member needs its own id");
                continue;
            }
            seen.put(id, idNode);
            result.add(new Written(id, f.node(), path, carries(f.node())));
        }
        return result;
    }

    /** The members a member's reaction loads name, each with the node that names it first. */
    private static Map<String, YamlNode> carries(YamlNode.Mapping member) {
        Map<String, YamlNode> result = new LinkedHashMap<>();
        YamlNode.Entry loads = member.entries().get("loads");
        if (loads != null && loads.value() instanceof YamlNode.Sequence s) {
            for (YamlNode item : s.items()) {
                if (item instanceof YamlNode.Mapping m && m.entries().get("type") != null
                        && m.entries().get("type").value() instanceof YamlNode.Scalar t && t.text().strip().equals("reaction")
                        && m.entries().get("member") != null && m.entries().get("member").value() instanceof YamlNode.Scalar id) {
                    result.putIfAbsent(id.text().strip(), id);
                }
            }
        }
        return result;
    }

    /**
     * The members in an order where each comes after every member whose reactions it carries,
     * keeping the written order where the load path leaves it free. Members in a cycle are
     * reported, naming every member of the cycle, and read last.
     */
    private List<Written> dependencyOrder(List<Written> written, Map<String, Written> byId) {
        List<Written> order = new ArrayList<>();
        Set<String> placed = new LinkedHashSet<>();
        boolean progress = true;
        while (progress && order.size() < written.size()) {
            progress = false;
            for (Written w : written) {
                if (!placed.contains(w.id()) && placed.containsAll(known(w, byId))) {
                    order.add(w);
                    placed.add(w.id());
                    progress = true;
                    break; // start again from the top, so the written order holds where it can
                }
            }
        }
        List<Written> left = written.stream().filter(w -> !placed.contains(w.id())).toList();
        if (!left.isEmpty()) {
            List<String> cycle = cycle(left, byId);
            Written first = byId.get(cycle.get(0));
            YamlNode at = first.carries().get(cycle.get(1));
            context.error(at, first.path() + ".loads", "members " + String.join(", ", new LinkedHashSet<>(cycle))
                    + " carry each other's reactions in a cycle (" + String.join(" -> ", cycle) + "): a load path must end"
                    + " at the supports; remove one of these reaction loads");
            order.addAll(left);
        }
        return order;
    }

    /** The members a member carries that exist in the job. */
    private static Set<String> known(Written w, Map<String, Written> byId) {
        Set<String> result = new LinkedHashSet<>(w.carries().keySet());
        result.retainAll(byId.keySet());
        return result;
    }

    /** One cycle among members none of which could be placed, as ids from a member back to itself. */
    private static List<String> cycle(List<Written> left, Map<String, Written> byId) {
        Set<String> unplaced = new LinkedHashSet<>(left.stream().map(Written::id).toList());
        List<String> path = new ArrayList<>();
        String at = left.get(0).id();
        while (!path.contains(at)) {
            path.add(at);
            Set<String> next = known(byId.get(at), byId);
            next.retainAll(unplaced);
            at = next.iterator().next(); // an unplaced member always carries another unplaced member
        }
        List<String> cycle = new ArrayList<>(path.subList(path.indexOf(at), path.size()));
        cycle.add(at);
        return cycle;
    }
}
