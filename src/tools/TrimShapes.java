import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Set;

/**
 * Derives the shipped shape table (src/main/resources/org/beamfolio/catalogue/aisc-shapes-v15.0.csv)
 * from the CSV conversion of the AISC Shapes Database v15.0: the beam families only, the columns
 * design and drawing use, and each row's metric designation from the SI table (whose rows are in
 * the same order). Values are copied as text, never recomputed. Run with the JDK alone:
 *
 * <pre>java src/tools/TrimShapes.java Shapes-US.csv Shapes-SI.csv OUT.csv</pre>
 */
public final class TrimShapes {
    static final Set<String> FAMILIES = Set.of("W", "M", "S", "HP", "C", "MC", "WT", "MT", "ST", "HSS", "PIPE");
    static final List<String> COLUMNS = List.of("AISC_Manual_Label", "EDI_Std_Nomenclature", "Type", "W", "A", "d",
            "Ht", "h", "OD", "bf", "B", "b", "tw", "tf", "tnom", "tdes", "kdes", "x", "y", "eo", "xp", "yp", "bf/2tf",
            "b/t", "b/tdes", "h/tw", "h/tdes", "D/t", "Ix", "Zx", "Sx", "rx", "Iy", "Zy", "Sy", "ry", "J", "Cw", "C",
            "Qf", "Qw", "ro", "H", "rts", "ho");

    public static void main(String[] args) throws IOException {
        List<String> us = Files.readAllLines(Path.of(args[0]), StandardCharsets.UTF_8);
        List<String> si = Files.readAllLines(Path.of(args[1]), StandardCharsets.UTF_8);
        List<String> header = Arrays.asList(us.get(0).split(",", -1));
        List<String> siHeader = Arrays.asList(si.get(0).split(",", -1));
        int type = header.indexOf("Type");
        int label = header.indexOf("AISC_Manual_Label");
        int siLabel = siHeader.indexOf("AISC_Manual_Label");
        List<String> out = new ArrayList<>();
        out.add("# AISC Shapes Database v15.0 (American Institute of Steel Construction), US customary units:");
        out.add("# in, in^2, in^3, in^4, in^6, lb/ft. Beam families only, derived by src/tools/TrimShapes.java from the");
        out.add("# CSV conversion (MIT licence, Copyright (c) 2022 Alexander Baker: LICENSE-csv-conversion.txt).");
        out.add("# AISC's disclaimer: AISC-DISCLAIMER.txt. Column names are the database's own; AISC_Manual_Label_SI");
        out.add("# is the metric designation from the database's SI table.");
        List<String> names = new ArrayList<>(COLUMNS);
        names.add(2, "AISC_Manual_Label_SI");
        out.add(String.join(",", names));
        for (int r = 1; r < us.size(); r++) {
            String[] row = us.get(r).split(",", -1);
            String[] siRow = si.get(r).split(",", -1);
            if (!FAMILIES.contains(row[type])) {
                continue;
            }
            if (!siRow[siHeader.indexOf("Type")].equals(row[type])) {
                throw new IllegalStateException("row " + r + ": the US and SI tables are out of step");
            }
            List<String> cells = new ArrayList<>();
            for (String c : COLUMNS) {
                cells.add(row[header.indexOf(c)]);
            }
            cells.add(2, siRow[siLabel]);
            if (!cells.get(0).equals(row[label])) {
                throw new IllegalStateException("row " + r);
            }
            out.add(String.join(",", cells));
        }
        Files.write(Path.of(args[2]), out, StandardCharsets.UTF_8);
    }
}
