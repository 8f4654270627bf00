package org.convgrid.plotting.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.convgrid.plotting.RunMaps;
import org.convgrid.plotting.TestRuns;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Opens the report in headless Chromium and checks that every image loads. The report itself has no script: the
 * test writes a copy beside it (same directory, so relative links resolve alike) with one inline script that, on
 * the load event, appends each image's load state to the DOM, which {@code --dump-dom} then prints. Skipped when
 * Chromium is not installed (Debian package {@code chromium}).
 */
class ReportInBrowserTest {

    private static final Path CHROMIUM = Path.of("/usr/bin/chromium");
    private static final long BROWSER_TIMEOUT_SECONDS = 90;
    private static final Pattern RESULT = Pattern.compile("IMGCHECK images=(\\d+) loaded=(\\d+) broken=\\[([^]]*)]");
    private static final String CHECK_SCRIPT = "<script>window.addEventListener('load', function () {"
            + " var imgs = Array.prototype.slice.call(document.images);"
            + " var ok = imgs.filter(function (i) { return i.complete && i.naturalWidth > 0; });"
            + " var bad = imgs.filter(function (i) { return !(i.complete && i.naturalWidth > 0); })"
            + ".map(function (i) { return i.getAttribute('src'); });"
            + " var p = document.createElement('pre'); p.id = 'imgcheck';"
            + " p.textContent = 'IMGCHECK images=' + imgs.length + ' loaded=' + ok.length + ' broken=[' + bad.join(',')"
            + " + ']'; document.body.appendChild(p); });</script>";

    @Test
    void everyImageOfTheReportLoads(@TempDir Path dir) throws Exception {
        Assumptions.assumeTrue(Files.isExecutable(CHROMIUM),
                "headless Chromium not installed at /usr/bin/chromium (Debian package chromium): browser check skipped");
        TestRuns.write(dir, TestRuns.rows(TestRuns.masses(0.1, 2.0, 10), new double[] {0.014}, new double[] {0, 1}));
        RunMaps.drawAll(dir);
        String html = Files.readString(ReportPage.write(dir));
        int expected = (int) ReportPageTest.IMG_SRC.matcher(html).results().count();
        assertThat(expected).isPositive();
        Path check = dir.resolve("report-imgcheck.html");
        Files.writeString(check, html.replace("</body>", CHECK_SCRIPT + "\n</body>"));

        String dom = dumpDom(check, Files.createDirectory(dir.resolve("chromium-profile")));
        Matcher m = RESULT.matcher(dom);
        assertThat(m.find()).as("check output in dumped DOM:%n%s", dom.length() > 2000 ? dom.substring(0, 2000)
                : dom).isTrue();
        assertThat(m.group(3)).as("images that did not load").isEmpty();
        assertThat(Integer.parseInt(m.group(1))).isEqualTo(expected);
        assertThat(Integer.parseInt(m.group(2))).isEqualTo(expected);
    }

    private static String dumpDom(Path page, Path profile) throws IOException, InterruptedException {
        List<String> command = new ArrayList<>(List.of(CHROMIUM.toString(), "--headless", "--no-sandbox",
                "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking",
                "--disable-component-update", "--disable-sync", "--user-data-dir=" + profile,
                "--virtual-time-budget=10000", "--dump-dom", page.toUri().toString()));
        Path out = profile.resolveSibling("chromium-stdout.html");
        Process process = new ProcessBuilder(command).redirectOutput(out.toFile())
                .redirectError(ProcessBuilder.Redirect.DISCARD).start();
        if (!process.waitFor(BROWSER_TIMEOUT_SECONDS, TimeUnit.SECONDS)) {
            process.destroyForcibly();
            throw new AssertionError("chromium did not finish within " + BROWSER_TIMEOUT_SECONDS + " s");
        }
        return Files.readString(out, StandardCharsets.UTF_8);
    }
}
