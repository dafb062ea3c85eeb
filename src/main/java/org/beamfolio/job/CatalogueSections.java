package org.beamfolio.job;

import java.util.Optional;
import org.beamfolio.catalogue.Shape;
import org.beamfolio.catalogue.ShapeCatalogue;
import org.beamfolio.catalogue.SteelGrade;
import org.beamfolio.model.SectionShape;

/** Reads {@code designation:} sections from the shape catalogue and {@code grade:} of steel materials. */
final class CatalogueSections {
    private CatalogueSections() {}

    /** The catalogue shape named, or null after a message naming the nearest designations. */
    static SectionShape read(ReadContext context, YamlNode node, String path) {
        String text = context.text(node, path);
        if (text == null) {
            return null;
        }
        ShapeCatalogue catalogue = ShapeCatalogue.aisc();
        Optional<Shape> shape = catalogue.find(text);
        if (shape.isEmpty()) {
            context.error(node, path, "\"" + text + "\" is not in the " + catalogue.source() + "; nearest: "
                    + String.join(", ", catalogue.nearest(text, 3)));
            return null;
        }
        return new SectionShape.Catalogued(shape.get());
    }

    /** The grade named, or null after a message listing the grades. */
    static SteelGrade grade(ReadContext context, YamlNode node, String path) {
        String text = context.text(node, path);
        if (text == null) {
            return null;
        }
        Optional<SteelGrade> grade = SteelGrade.find(text);
        if (grade.isEmpty()) {
            context.error(node, path, "unknown steel grade \"" + text + "\" (one of: "
                    + String.join(", ", SteelGrade.labels()) + ")");
            return null;
        }
        return grade.get();
    }
}
