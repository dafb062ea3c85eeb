package org.beamfolio.cli;

import java.util.List;

/**
 * Commented starter job files, one per layout, in US or SI units: every key of format 1 is
 * there with a comment saying what it means, ready to edit and build. The numbers are
 * placeholders of a plausible size, not a design.
 */
final class Starter {
    static final List<String> LAYOUTS = List.of("simple-span", "overhang", "cantilever", "continuous");

    private Starter() {}

    static String of(String layout, boolean si) {
        String m = si ? "m" : "ft";
        StringBuilder s = new StringBuilder();
        s.append("# Beamfolio job file, format 1: a ").append(layout.replace('-', ' ')).append(" starter in ").append(si ? "SI" : "US")
                .append(" units.\n")
                .append("# Every quantity is \"<number> <unit>\"; loads are positive downward. Replace every value.\n")
                .append("beamfolio: 1                       # format version (required)\n\n")
                .append("project:                           # printed on the cover and in every title block\n")
                .append("  title: New project - beam B-1    # project title\n")
                .append("  number: \"00-000\"                 # project number (quoted so it stays text)\n")
                .append("  client: Client name              # who the calculation is for\n")
                .append("  location: Site address           # where the beam is\n")
                .append("  subject: What this beam is and why it is checked\n")
                .append("  prepared_by: Your name           # prepared by\n")
                .append("  checked_by: \"\"                   # blank: the reviewer fills it in\n")
                .append("  date: 2026-01-01                 # YYYY-MM-DD; also the PDF's date\n")
                .append("  revision: A                      # current revision\n")
                .append("  history:                         # optional, oldest first\n")
                .append("    - { rev: A, date: 2026-01-01, by: Your name, note: First issue }\n")
                .append("  notes: |                         # optional free text for the design basis\n")
                .append("    Field measurements, assumptions and references go here.\n\n")
                .append("report:\n")
                .append("  units: ").append(si ? "SI" : "US").append("                         # US or SI: the units the package reports in\n")
                .append("  paper: ").append(si ? "a4    " : "letter").append("                     # letter or a4\n\n")
                .append("materials:                         # one or more, referred to by name\n")
                .append("  steel:\n")
                .append("    E: ").append(si ? "200 GPa" : "29000 ksi").append("                     # elastic modulus\n")
                .append("    density: ").append(si ? "7850 kg/m^3" : "490 pcf").append("             # optional; needed for self_weight\n")
                .append("    allowable:                     # optional; needed when checks.stress is true\n")
                .append("      tension: ").append(si ? "165 MPa" : "30 ksi").append("\n")
                .append("      compression: ").append(si ? "165 MPa" : "30 ksi").append("\n")
                .append("      shear: ").append(si ? "100 MPa" : "20 ksi").append("\n")
                .append("    source: Where E and the allowables come from (printed in the package)\n\n")
                .append("sections:                          # one or more, referred to by name\n")
                .append("  main:\n")
                .append("    shape: i_beam                  # rectangle, circle, tube, pipe, i_beam, tee, channel, plates, given\n")
                .append("    d: ").append(si ? "300 mm" : "12 in").append("                        # depth\n")
                .append("    bf: ").append(si ? "150 mm" : "6.5 in").append("                       # flange width\n")
                .append("    tf: ").append(si ? "10 mm" : "0.4 in").append("                        # flange thickness\n")
                .append("    tw: ").append(si ? "7 mm" : "0.25 in").append("                         # web thickness\n")
                .append("    # flip: true                   # turn the section upside down\n\n");
        s.append("beam:\n");
        String length;
        String supports;
        String loads;
        switch (layout) {
            case "overhang" -> {
                length = si ? "8 m" : "26 ft";
                supports = "    - { at: 0 " + m + ", type: pin }\n    - { at: " + (si ? "6" : "20") + " " + m + ", type: roller }\n";
                loads = "  - { case: D, type: uniform, w: " + (si ? "5 kN/m" : "350 lb/ft") + ", note: dead load over the whole beam }\n"
                        + "  - { case: L, type: uniform, w: " + (si ? "8 kN/m" : "600 lb/ft") + ", from: 0 " + m + ", to: " + (si ? "6" : "20")
                        + " " + m + ", note: live load on the back span }\n"
                        + "  - { case: L, type: point, P: " + (si ? "10 kN" : "2 kip") + ", at: " + (si ? "8" : "26") + " " + m
                        + ", note: point load at the tip }\n";
            }
            case "cantilever" -> {
                length = si ? "2 m" : "6 ft";
                supports = "    - { at: 0 " + m + ", type: fixed }            # pin, roller, fixed, or spring (k:, optional kr:)\n";
                loads = "  - { case: D, type: uniform, w: " + (si ? "3 kN/m" : "200 lb/ft") + ", note: dead load }\n"
                        + "  - { case: L, type: point, P: " + (si ? "5 kN" : "1 kip") + ", at: " + (si ? "2" : "6") + " " + m
                        + ", note: load at the free end }\n";
            }
            case "continuous" -> {
                length = si ? "18 m" : "60 ft";
                supports = "    - { at: 0 " + m + ", type: pin }\n    - { at: " + (si ? "6" : "20") + " " + m + ", type: roller }\n"
                        + "    - { at: " + (si ? "12" : "40") + " " + m + ", type: roller }\n    - { at: " + (si ? "18" : "60") + " " + m
                        + ", type: roller }\n";
                loads = "  - { case: D, type: uniform, w: " + (si ? "4 kN/m" : "300 lb/ft") + ", note: dead load }\n"
                        + "  - { case: L, type: uniform, w: " + (si ? "6 kN/m" : "450 lb/ft") + ", note: live load patterned below }\n";
            }
            default -> {
                length = si ? "6 m" : "20 ft";
                supports = "    - { at: 0 " + m + ", type: pin }              # pin, roller, fixed, or spring (k:, optional kr:)\n"
                        + "    - { at: " + (si ? "6" : "20") + " " + m + ", type: roller }\n";
                loads = "  - { case: D, type: uniform, w: " + (si ? "5 kN/m" : "350 lb/ft") + ", note: dead load }\n"
                        + "  - { case: L, type: uniform, w: " + (si ? "8 kN/m" : "600 lb/ft") + ", note: live load }\n"
                        + "  - { case: L, type: point, P: " + (si ? "10 kN" : "2 kip") + ", at: " + (si ? "2" : "8") + " " + m
                        + ", note: a point load }\n";
            }
        }
        s.append("  length: ").append(length).append("                      # total length; x runs from the left end\n")
                .append("  section: main                    # the section over the whole beam\n")
                .append("  material: steel                  # the material over the whole beam\n")
                .append("  supports:                        # at least one; a beam must not be a mechanism\n")
                .append(supports)
                .append("  hinges: []                       # internal moment releases, e.g. [ 4 ").append(m).append(" ]\n")
                .append("  # segments:                      # another section or material over a range\n")
                .append("  #   - { from: 0 ").append(m).append(", to: 1 ").append(m).append(", section: main, material: steel }\n")
                .append("  self_weight: D                   # optional: adds the beam's own weight to this case\n\n")
                .append("loads:                             # point (P, at), moment (M, at, sense: cw|ccw), uniform (w, from, to), linear (w: [start, end], from, to)\n")
                .append(loads)
                .append("\ncases:                             # optional descriptions of the load cases\n")
                .append("  D: Dead\n  L: Live\n\n")
                .append("combinations: ").append(si ? "EN1990" : "ASCE7-ASD")
                .append("          # ASCE7-ASD, ASCE7-LRFD, EN1990, or a list of { name, factors }\n");
        if (layout.equals("continuous")) {
            s.append("pattern: [ L ]                     # also apply these cases span by span for the envelope\n");
        }
        s.append("\nchecks:\n")
                .append("  stress: true                     # fibre and shear stress against the allowables\n")
                .append("  deflection:                      # limits on unfactored cases: limit L/n per span, or max\n")
                .append("    - { cases: [ L ], limit: L/360 }\n")
                .append("    - { cases: [ D, L ], limit: L/240 }\n");
        return s.toString();
    }
}
