package org.beamfolio.job;

import org.beamfolio.units.Dimension;
import org.beamfolio.units.QuantityParser;
import org.beamfolio.units.UnitSystem;

/**
 * The unit system a job is written in, for a job that does not say (no {@code report.units}): the
 * system of the beam's length, so a beam typed in metres is reported and talked about in SI and
 * one typed in feet in US units. Without a readable length, US units, as before.
 */
final class JobUnits {
    private JobUnits() {}

    static UnitSystem of(YamlNode beam) {
        if (beam instanceof YamlNode.Mapping m && m.entries().get("length") != null
                && m.entries().get("length").value() instanceof YamlNode.Scalar s) {
            QuantityParser.Result length = QuantityParser.parse(s.text(), Dimension.LENGTH);
            if (length.ok() && !length.unit().symbol().equals("ft") && !length.unit().symbol().equals("in")) {
                return UnitSystem.SI;
            }
        }
        return UnitSystem.US;
    }
}
