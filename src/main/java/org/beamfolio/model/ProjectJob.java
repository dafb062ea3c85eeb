package org.beamfolio.model;

import java.util.List;

/**
 * A job file with {@code members}: one package for several members that share the project,
 * materials, sections, area loads, design settings and combinations. Each member is a
 * {@link Job} of its own, as a single-beam job would be, whose {@link Job#reactionLoads()} name
 * the members that rest on it.
 *
 * @param members in the order the file writes them (the package's order)
 * @param order the members' ids in dependency order: every member after those whose reactions it carries
 */
public record ProjectJob(String name, String sourceText, String sha256, byte[] sourceBytes, List<Job> members,
                         List<String> order) {
    public ProjectJob {
        members = List.copyOf(members);
        order = List.copyOf(order);
        sourceBytes = sourceBytes.clone();
        if (members.isEmpty() || members.size() != order.size()) {
            throw new IllegalArgumentException("a project has at least one member, each once in the order");
        }
    }

    @Override
    public byte[] sourceBytes() {
        return sourceBytes.clone();
    }

    /** The member of that id. */
    public Job member(String id) {
        return members.stream().filter(m -> id.equals(m.member())).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no member " + id));
    }
}
