package org.beamfolio.report;

import com.lowagie.text.pdf.BaseFont;
import freemarker.cache.ClassTemplateLoader;
import freemarker.core.XHTMLOutputFormat;
import freemarker.template.Configuration;
import freemarker.template.Template;
import freemarker.template.TemplateException;
import freemarker.template.TemplateExceptionHandler;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.Map;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.results.CheckOutcome;
import org.xhtmlrenderer.pdf.ITextRenderer;

/**
 * The report stage's entry point: merges the {@link ReportModel} into the FreeMarker templates
 * (XHTML output, auto-escaped, so free text from the job prints exactly as typed) and lays the
 * XHTML out as a paginated PDF with the embedded DejaVu fonts from fonts/.
 */
public final class PackageRenderer {
    static final String TEMPLATE = "package.ftlx";
    private static final String[] FONTS = {"DejaVuSans.ttf", "DejaVuSans-Bold.ttf", "DejaVuSansMono.ttf"};

    private final Configuration templates;

    public PackageRenderer() {
        templates = new Configuration(Configuration.VERSION_2_3_34);
        templates.setTemplateLoader(new ClassTemplateLoader(PackageRenderer.class, "/report-templates"));
        templates.setOutputFormat(XHTMLOutputFormat.INSTANCE);
        templates.setDefaultEncoding("UTF-8");
        templates.setTemplateExceptionHandler(TemplateExceptionHandler.RETHROW_HANDLER);
        templates.setLogTemplateExceptions(false);
        templates.setFallbackOnNullLoopVariable(false);
        templates.setLocale(java.util.Locale.US);
    }

    /** The XHTML of the package, before layout (what the golden tests compare). */
    public String xhtml(AnalysisResult result, List<CheckOutcome> checks) {
        ReportModel model = new ReportModelBuilder(result).build(checks);
        try {
            Template template = templates.getTemplate(TEMPLATE);
            StringWriter out = new StringWriter();
            template.process(Map.of("r", model), out);
            return out.toString();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (TemplateException e) {
            throw new IllegalStateException("report template failed: " + e.getMessage(), e);
        }
    }

    public byte[] render(AnalysisResult result, List<CheckOutcome> checks) {
        String xhtml = xhtml(result, checks);
        try {
            ITextRenderer renderer = new ITextRenderer();
            for (String font : FONTS) {
                // the renderer reads the font's description again by this name: a classpath resource
                String name = "fonts/" + font;
                byte[] bytes = resource("/" + name);
                BaseFont base = BaseFont.createFont(name, BaseFont.IDENTITY_H, BaseFont.EMBEDDED, true, bytes, null);
                renderer.getFontResolver().addFont(base, name, null);
            }
            renderer.setDocumentFromString(xhtml);
            renderer.layout();
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            renderer.createPDF(out);
            return out.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (com.lowagie.text.DocumentException e) {
            throw new IllegalStateException("PDF layout failed: " + e.getMessage(), e);
        }
    }

    private static byte[] resource(String path) throws IOException {
        try (InputStream in = PackageRenderer.class.getResourceAsStream(path)) {
            if (in == null) {
                throw new IOException("missing resource " + path);
            }
            return in.readAllBytes();
        }
    }
}
