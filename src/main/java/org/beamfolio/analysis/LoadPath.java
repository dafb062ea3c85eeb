package org.beamfolio.analysis;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.beamfolio.model.Job;
import org.beamfolio.model.ProjectJob;
import org.beamfolio.model.ReactionLoad;

/**
 * The order members of a job are solved in: level 0 carries no other member's reaction; a member
 * of level n carries at least one of level n - 1 and none above it. Members of one level do not
 * depend on each other, so they may be solved at the same time.
 */
public final class LoadPath {
    private LoadPath() {}

    public static List<List<Job>> levels(ProjectJob project) {
        Map<String, Integer> level = new HashMap<>();
        List<List<Job>> levels = new ArrayList<>();
        for (String id : project.order()) {
            Job member = project.member(id);
            int own = 0;
            for (ReactionLoad r : member.reactionLoads()) {
                Integer carried = level.get(r.member());
                if (carried == null) {
                    throw new IllegalArgumentException("member " + id + " comes before " + r.member() + ", whose reaction it carries");
                }
                own = Math.max(own, carried + 1);
            }
            level.put(id, own);
            while (levels.size() <= own) {
                levels.add(new ArrayList<>());
            }
            levels.get(own).add(member);
        }
        return levels;
    }
}
