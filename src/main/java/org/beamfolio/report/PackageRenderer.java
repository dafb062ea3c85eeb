package org.beamfolio.report;

import freemarker.cache.ClassTemplateLoader;
import freemarker.core.XHTMLOutputFormat;
import freemarker.template.Configuration;
import freemarker.template.Template;
import freemarker.template.TemplateException;
import freemarker.template.TemplateExceptionHandler;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.concurrent.Executor;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.report.drawing.Chart;
import org.beamfolio.report.drawing.Drawing;
import org.beamfolio.report.pdf.PdfRenderer;
import org.beamfolio.checks.CheckOutcome;
import org.beamfolio.checks.CheckedMember;

/**
 * The report stage's entry point: gathers the {@link ReportModel}, merges it into the FreeMarker
 * templates of report-templates/ (XHTML output, auto-escaped, so free text from the job prints
 * exactly as typed) and lays the XHTML out as a paginated PDF with embedded fonts, vector
 * diagrams and the job file attached.
 */
public final class PackageRenderer {
    static final String TEMPLATE = "package.ftlx";
    static final String STYLE = "package.css";
    static final String PROJECT_TEMPLATE = "project.ftlx";

    private final CompletableFuture<Configuration> templates;
    private final CompletableFuture<PdfRenderer> pdf;

    /**
     * Starts setting up the templates and then the PDF stack on a thread of their own and
     * returns at once: setting them up is a large share of a one-job run, and it overlaps with
     * the caller reading and solving the job. The first package waits for what is not ready.
     */
    public PackageRenderer() {
        Executor ownThread = task -> {
            Thread thread = new Thread(task, "beamfolio-report-setup");
            thread.setDaemon(true);
            thread.start();
        };
        templates = CompletableFuture.supplyAsync(PackageRenderer::configuration, ownThread);
        pdf = templates.thenApply(ready -> new PdfRenderer(rehearsal()));
    }

    /** A small diagram of the kind every package draws, drawn once while setting up. */
    private static Drawing rehearsal() {
        double[] x = {0, 1, 2};
        return new Chart("M", "x", List.of(new Chart.Series("M", x, new double[] {0, 1, 0})),
                List.of(new Chart.Mark(1, 1, "1")), false);
    }

    private static Configuration configuration() {
        Configuration templates = new Configuration(Configuration.VERSION_2_3_34);
        templates.setTemplateLoader(new ClassTemplateLoader(PackageRenderer.class, "/report-templates"));
        templates.setOutputFormat(XHTMLOutputFormat.INSTANCE);
        templates.setDefaultEncoding("UTF-8");
        templates.setTemplateExceptionHandler(TemplateExceptionHandler.RETHROW_HANDLER);
        templates.setLogTemplateExceptions(false);
        templates.setFallbackOnNullLoopVariable(false);
        templates.setLocale(Locale.US);
        try {
            // parsed now and cached by the configuration
            templates.getTemplate(TEMPLATE);
            templates.getTemplate(STYLE);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return templates;
    }

    private static <T> T ready(CompletableFuture<T> part) {
        try {
            return part.join();
        } catch (CompletionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            if (e.getCause() instanceof Error error) {
                throw error;
            }
            throw e;
        }
    }

    /** The XHTML of the package, before layout (what the golden tests compare). */
    public String xhtml(AnalysisResult result, List<CheckOutcome> checks) {
        return xhtml(new ReportModelBuilder(result).build(checks).model());
    }

    private String xhtml(ReportModel model) {
        return xhtml(TEMPLATE, model);
    }

    private String xhtml(String templateName, Object model) {
        try {
            Template template = ready(templates).getTemplate(templateName);
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
        return render(result, checks, null, true);
    }

    /**
     * @param previous an earlier revision, for a revision-delta sheet, or null
     * @param archival PDF/A-3b (the default) or a plain PDF
     */
    public byte[] render(AnalysisResult result, List<CheckOutcome> checks, PreviousRevision previous, boolean archival) {
        ReportModelBuilder.Built built = new ReportModelBuilder(result).build(checks, previous);
        String xhtml = xhtml(built.model());
        PdfRenderer.Attachment job = new PdfRenderer.Attachment(result.job().name() + ".yaml",
                result.job().sourceBytes(), "Job file of this calculation package");
        String flag = org.beamfolio.checks.ChecksVerdict.of(checks);
        return ready(pdf).render(xhtml, built.drawings(), job, result.job().project().date(), archival, result.job().project().title(),
                flag);
    }

    /** The XHTML of a package of several members, before layout. */
    public String membersXhtml(List<CheckedMember> members) {
        return xhtml(PROJECT_TEMPLATE, project(members).model());
    }

    /** One package of several members: cover, schedule, basis, each member's part, load path, sign-off, job file. */
    public byte[] renderMembers(List<CheckedMember> members, boolean archival) {
        Built built = project(members);
        String xhtml = xhtml(PROJECT_TEMPLATE, built.model());
        var job = members.get(0).result().job();
        Map<String, PdfRenderer.Attachment> files = new java.util.LinkedHashMap<>();
        for (CheckedMember m : members) {
            var source = m.result().job();
            files.putIfAbsent(source.name() + ".yaml", new PdfRenderer.Attachment(source.name() + ".yaml", source.sourceBytes(),
                    "Job file of this calculation package"));
        }
        return ready(pdf).render(xhtml, built.drawings(), List.copyOf(files.values()), job.project().date(), archival,
                job.project().title(), org.beamfolio.checks.ChecksVerdict.ofMembers(members));
    }

    private record Built(ProjectModel model, Map<String, Drawing> drawings) {}

    /** Each member's part built as for a one-member package, its figures renamed under the member's prefix. */
    private static Built project(List<CheckedMember> members) {
        Map<String, Drawing> drawings = new java.util.LinkedHashMap<>();
        List<ProjectPart.Built> parts = new java.util.ArrayList<>();
        for (int i = 0; i < members.size(); i++) {
            CheckedMember m = members.get(i);
            ReportModelBuilder.Built built = new ReportModelBuilder(m.result()).build(m.checks());
            for (Map.Entry<String, Drawing> d : built.drawings().entrySet()) {
                // the basis and the cover are printed once, with the first member's sketches
                boolean shared = d.getKey().equals(ReportModelBuilder.SIGN_CONVENTION) || d.getKey().equals(ReportModelBuilder.SEAL_BOX);
                if (!shared) {
                    drawings.put(ProjectPart.ns(i) + d.getKey(), d.getValue());
                } else {
                    drawings.putIfAbsent(d.getKey(), d.getValue());
                }
            }
            parts.add(new ProjectPart.Built(m.id(), m.result(), m.checks(), built.model()));
        }
        return new Built(new ProjectPart(parts).build(), drawings);
    }
}
