package org.beamfolio.model;

import java.util.List;

/** The project block printed on the cover and in every title block; free text, kept as typed. */
public record Project(String title, String number, String client, String location, String subject,
                      String preparedBy, String checkedBy, String date, String revision,
                      List<Revision> history, String notes) {
    public Project {
        history = List.copyOf(history);
    }

    public record Revision(String rev, String date, String by, String note) {}
}
