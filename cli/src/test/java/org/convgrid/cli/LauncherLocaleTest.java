package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The launcher's choice of the UTF-8 locale it runs the JVM under when the session's is C or POSIX, so that
 * non-ASCII paths work ({@link UnusablePath}): C.UTF-8 where the system has it, else en_US.UTF-8, else any UTF-8
 * locale (older glibc and macOS have no C.UTF-8), else none; and {@code locale -a} never runs in a session
 * that is UTF-8 already, which would pay for it at every start. The launcher's own function is run by bash, with a
 * {@code locale} command of the test's that lists the locales a system might have and records that it ran.
 */
class LauncherLocaleTest {

    /**
     * What the launcher adds when it chooses a language's locale: the JVM's default locale as under C (en_US), as a
     * few status_detail texts are formatted in it ("1,5" under de_DE).
     */
    private static final String PINNED = "-Duser.language=en -Duser.country=US";

    @TempDir
    Path work;

    /**
     * The launcher's locale block, run under {@code environment} on a system with {@code available} locales: the
     * LC_ALL it leaves for the JVM (empty when unset), a bar, then the JVM options it added.
     */
    private String chosen(String available, Map<String, String> environment) throws Exception {
        Path launcher = Path.of("").toAbsolutePath().getParent().resolve("convgrid");
        String script = Files.readString(launcher, StandardCharsets.UTF_8);
        int start = script.indexOf("utf8_locale_on_system() {");
        int end = script.indexOf("# (end of the UTF-8 locale block)");
        assertThat(start).as("the launcher's locale block").isNotNegative().isLessThan(end);
        Path bin = Files.createDirectories(work.resolve("bin"));
        Path fake = bin.resolve("locale");
        Files.writeString(fake, "#!/bin/sh\necho ran >>'" + work.resolve("locale-ran") + "'\nprintf '%s\\n' "
                + "\"$FAKE_LOCALES\"\n");
        Files.setPosixFilePermissions(fake, PosixFilePermissions.fromString("rwxr-xr-x"));
        ProcessBuilder bash = new ProcessBuilder("bash", "-c", "set -euo pipefail\njvm_options=()\n"
                + script.substring(start, end) + "echo \"${LC_ALL:-}|${jvm_options[*]:-}\"\n")
                // bash's own warning of a locale this system lacks is no part of the answer
                .redirectError(ProcessBuilder.Redirect.DISCARD);
        Map<String, String> env = bash.environment();
        env.remove("LC_ALL");
        env.remove("LC_CTYPE");
        env.remove("LANG");
        env.putAll(environment);
        env.put("FAKE_LOCALES", available);
        env.put("PATH", bin + ":" + System.getenv("PATH"));
        Process p = bash.start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertThat(p.waitFor()).as(out).isZero();
        return out.strip();
    }

    private boolean localeRan() {
        return Files.exists(work.resolve("locale-ran"));
    }

    @Test
    void prefersCUtf8() throws Exception {
        assertThat(chosen("C\nC.utf8\nPOSIX\nen_US.utf8", Map.of("LC_ALL", "C"))).isEqualTo("C.utf8|");
        assertThat(chosen("C\nC.UTF-8\nPOSIX\nen_US.UTF-8", Map.of("LANG", "POSIX"))).isEqualTo("C.UTF-8|");
    }

    @Test
    void fallsBackOnEnUsUtf8WhenThereIsNoCUtf8() throws Exception {
        // as macOS lists them: no C.UTF-8, several UTF-8 locales, en_US.UTF-8 not first
        assertThat(chosen("C\nPOSIX\nde_DE.UTF-8\nen_GB.UTF-8\nen_US.ISO8859-1\nen_US.UTF-8", Map.of("LC_ALL", "C")))
                .isEqualTo("en_US.UTF-8|" + PINNED);
        assertThat(chosen("C\nPOSIX\nen_US.utf8", Map.of())).isEqualTo("en_US.utf8|" + PINNED);
    }

    @Test
    void fallsBackOnAnyUtf8LocaleWhenThereIsNoEnUs() throws Exception {
        assertThat(chosen("C\nPOSIX\nfr_FR.ISO-8859-1\nde_DE.utf8\nsv_SE.UTF-8", Map.of("LC_CTYPE", "C")))
                .isEqualTo("de_DE.utf8|" + PINNED);
    }

    @Test
    void withoutAUtf8LocaleLeavesTheLocaleAsItIs() throws Exception {
        assertThat(chosen("C\nPOSIX\nfr_FR.ISO-8859-1", Map.of("LC_ALL", "C"))).isEqualTo("C|");
        assertThat(chosen("", Map.of())).isEqualTo("|");
    }

    @Test
    void aUtf8SessionNeverRunsLocale() throws Exception {
        assertThat(chosen("C\nC.utf8", Map.of("LANG", "en_GB.UTF-8"))).isEqualTo("|");
        assertThat(chosen("C\nC.utf8", Map.of("LC_ALL", "de_DE.UTF-8", "LANG", "C"))).isEqualTo("de_DE.UTF-8|");
        assertThat(localeRan()).isFalse();
        chosen("C\nC.utf8", Map.of("LC_ALL", "C"));
        assertThat(localeRan()).isTrue();
    }
}
