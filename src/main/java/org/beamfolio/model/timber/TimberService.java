package org.beamfolio.model.timber;

/**
 * Service conditions of a timber member (job key `design.timber_service`).
 *
 * @param wet moisture content in service above 19 % (sawn) or 16 % (glulam), NDS 4.3.3 and 5.3.3
 * @param repetitive three or more members at no more than 24 in on centre joined by a load
 *     distributing element (NDS 4.3.9)
 * @param incised sawn lumber incised for preservative treatment (NDS 4.3.8)
 */
public record TimberService(boolean wet, Temperature temperature, boolean repetitive, boolean incised) {
    public static final TimberService DEFAULT = new TimberService(false, Temperature.NORMAL, false, false);
}
