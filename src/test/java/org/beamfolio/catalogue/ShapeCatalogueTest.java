package org.beamfolio.catalogue;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/**
 * The shipped catalogue against the AISC Shapes Database v15.0 (the rows quoted are those of the
 * database; the same values are printed in the 15th edition Manual, Tables 1-1, 1-11, 1-12, 1-13).
 */
class ShapeCatalogueTest {
    static final double IN = 0.0254;
    final ShapeCatalogue catalogue = ShapeCatalogue.aisc();

    @Test
    void findsADesignationWhateverItsCaseSpacesOrX() {
        Shape w = catalogue.find("W18X50").orElseThrow();
        assertSame(w, catalogue.find("w18x50").orElseThrow());
        assertSame(w, catalogue.find(" W18 x 50 ").orElseThrow());
        assertSame(w, catalogue.find("W18×50").orElseThrow());
    }

    @Test
    void findsTheMetricDesignationOfTheSameRow() {
        // AISC Shapes Database v15.0, SI table: W460X74 is the metric designation of W18X50
        assertSame(catalogue.find("W18X50").orElseThrow(), catalogue.find("w460x74").orElseThrow());
        assertEquals("W460X74", catalogue.find("W18X50").orElseThrow().metricDesignation());
    }

    @Test
    void findsAnHssByItsManualLabelOrItsEdiName() {
        Shape hss = catalogue.find("HSS10X6X3/16").orElseThrow();
        assertSame(hss, catalogue.find("hss10x6x.188").orElseThrow());
        assertEquals(ShapeFamily.HSS_RECTANGULAR, hss.family());
        assertEquals(ShapeFamily.PIPE, catalogue.find("pipe6std").orElseThrow().family());
        assertEquals(ShapeFamily.HSS_ROUND, catalogue.find("HSS6.625X.280").orElseThrow().family());
    }

    @Test
    void tabulatedValuesConvertOnceToSi() {
        // AISC Shapes Database v15.0, W18X50: A = 14.7 in^2, Zx = 101 in^3, Ix = 800 in^4,
        // Cw = 3040 in^6, W = 50 lb/ft
        Shape w = catalogue.find("W18X50").orElseThrow();
        assertEquals("101", w.tabulated(ShapeProperty.ZX));
        assertEquals(14.7 * IN * IN, w.get(ShapeProperty.A), 1e-15);
        assertEquals(101 * Math.pow(IN, 3), w.get(ShapeProperty.ZX), 1e-15);
        assertEquals(800 * Math.pow(IN, 4), w.get(ShapeProperty.IX), 1e-15);
        assertEquals(3040 * Math.pow(IN, 6), w.get(ShapeProperty.CW), 1e-20);
        // 1 lb/ft = 14.5939 N/m (NIST SP 811, Appendix B)
        assertEquals(50 * 14.5939, w.get(ShapeProperty.W), 0.01);
        assertTrue(!w.has(ShapeProperty.TDES));
    }

    @Test
    void holdsEveryBeamFamilyAndNoAngles() {
        Set<ShapeFamily> families = catalogue.shapes().stream().map(Shape::family).collect(Collectors.toSet());
        assertEquals(EnumSet.allOf(ShapeFamily.class), families);
        assertTrue(catalogue.find("L4X4X1/2").isEmpty());
        // AISC Shapes Database v15.0 counts: 283 W, 283 WT, 516 HSS (rectangular, square, round), 51 PIPE
        assertEquals(283, catalogue.shapes().stream().filter(s -> s.family() == ShapeFamily.W).count());
        assertEquals(516, catalogue.shapes().stream()
                .filter(s -> s.family() == ShapeFamily.HSS_RECTANGULAR || s.family() == ShapeFamily.HSS_ROUND).count());
        assertEquals(51, catalogue.shapes().stream().filter(s -> s.family() == ShapeFamily.PIPE).count());
    }

    @Test
    void everyRowHasWhatDesignNeeds() {
        for (Shape s : catalogue.shapes()) {
            List<ShapeProperty> needed = switch (s.family().kind()) {
                case I_SHAPE -> List.of(ShapeProperty.D, ShapeProperty.BF, ShapeProperty.TF, ShapeProperty.TW,
                        ShapeProperty.KDES, ShapeProperty.ZX, ShapeProperty.SX, ShapeProperty.RY, ShapeProperty.J,
                        ShapeProperty.CW, ShapeProperty.RTS, ShapeProperty.HO, ShapeProperty.BF_2TF, ShapeProperty.H_TW);
                case CHANNEL -> List.of(ShapeProperty.D, ShapeProperty.TF, ShapeProperty.TW, ShapeProperty.KDES,
                        ShapeProperty.ZX, ShapeProperty.SX, ShapeProperty.RY, ShapeProperty.J, ShapeProperty.CW,
                        ShapeProperty.IY, ShapeProperty.RTS, ShapeProperty.HO, ShapeProperty.B_T, ShapeProperty.H_TW);
                case TEE -> List.of(ShapeProperty.D, ShapeProperty.TW, ShapeProperty.IX, ShapeProperty.Y_BAR,
                        ShapeProperty.ZX, ShapeProperty.SX, ShapeProperty.IY, ShapeProperty.RY, ShapeProperty.J,
                        ShapeProperty.BF_2TF, ShapeProperty.D_T);
                case RECTANGULAR_HSS -> List.of(ShapeProperty.HT, ShapeProperty.B, ShapeProperty.TDES,
                        ShapeProperty.B_FLAT, ShapeProperty.H_FLAT, ShapeProperty.B_TDES, ShapeProperty.H_TDES,
                        ShapeProperty.ZX, ShapeProperty.SX, ShapeProperty.IX, ShapeProperty.RY, ShapeProperty.J,
                        ShapeProperty.A);
                case ROUND_HSS -> List.of(ShapeProperty.OD, ShapeProperty.TDES, ShapeProperty.D_T, ShapeProperty.ZX,
                        ShapeProperty.SX, ShapeProperty.A);
            };
            for (ShapeProperty p : needed) {
                assertTrue(s.has(p), s + " lacks " + p.column());
            }
            assertNotNull(s.metricDesignation(), s.designation());
        }
    }

    @Test
    void anUnknownDesignationSuggestsTheNearestFirst() {
        assertTrue(catalogue.find("W18X51").isEmpty());
        assertEquals(List.of("W18X50", "W18X55", "W18X46"), catalogue.nearest("w18x51", 3));
        assertEquals("W460X74", catalogue.nearest("W460X75", 1).get(0));
        assertEquals("HSS10X6X3/16", catalogue.nearest("HSS10X6X3/15", 1).get(0));
    }

    @Test
    void recordsItsSourceAndShipsTheLicenceAndDisclaimer() throws Exception {
        assertEquals("AISC Shapes Database v15.0", catalogue.source());
        for (String name : List.of(ShapeCatalogue.RESOURCE, "LICENSE-csv-conversion.txt", "AISC-DISCLAIMER.txt")) {
            try (var in = ShapeCatalogue.class.getResourceAsStream(name)) {
                assertNotNull(in, name);
                String text = new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
                if (name.startsWith("LICENSE")) {
                    assertTrue(text.contains("Copyright (c) 2022 Alexander Baker"));
                    assertTrue(text.contains("Permission is hereby granted"));
                }
                if (name.startsWith("AISC")) {
                    assertTrue(text.contains("American Institute of Steel Construction"));
                }
                if (name.endsWith(".csv")) {
                    assertTrue(text.startsWith("# AISC Shapes Database v15.0"));
                }
            }
        }
    }
}
