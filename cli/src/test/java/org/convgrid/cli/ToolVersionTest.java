package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assumptions.assumeThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Properties;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ToolVersionTest {

    @TempDir
    Path work;

    @Test
    void versionOptionPrintsTheVersionAndTheCommitTheBuildRecorded() {
        CliHarness.Execution v = CliHarness.in(work, FakeChunkSolver.fast()).execute("--version");
        assertThat(v.code()).isEqualTo(0);
        assertThat(v.out()).isEqualTo("convgrid " + ToolVersion.current() + "\ncommit " + ToolVersion.commit() + "\n");
        // the build filters the project's version in; "development" was what an unpackaged build used to say
        assertThat(ToolVersion.current()).matches("\\d+\\.\\d+\\.\\d+(-SNAPSHOT)?");
        assertThat(ToolVersion.commit()).matches("[0-9a-f]{40}(-dirty)?|unknown");
    }

    @Test
    void inAGitCheckoutTheRecordedCommitIsTheCheckoutsHead() throws Exception {
        // the tests run from the module directory; a source tarball has no .git and is covered below
        Path root = Path.of("").toAbsolutePath().getParent();
        assumeThat(Files.exists(root.resolve(".git"))).as("built from a git checkout").isTrue();
        String head = git(root, "rev-parse", "HEAD");
        assumeThat(head).as("git on the PATH").isNotNull();
        assertThat(ToolVersion.commit()).startsWith(head.strip());
    }

    @Test
    void placeholdersTheBuildDidNotFillSayUnknown() {
        // what classes built without the git-provenance profile (outside a git checkout) or without resource
        // filtering carry
        Properties unfiltered = new Properties();
        unfiltered.setProperty("version", "${project.version}");
        unfiltered.setProperty("commit", "${git.commit.id}");
        unfiltered.setProperty("dirty", "${git.dirty}");
        ToolVersion v = ToolVersion.from(unfiltered);
        assertThat(v.versionText()).isEqualTo("unknown");
        assertThat(v.commitText()).isEqualTo("unknown");
        assertThat(v.getVersion()).containsExactly("convgrid unknown", "commit unknown");
        assertThat(ToolVersion.from(new Properties()).commitText()).isEqualTo("unknown");
    }

    @Test
    void aSourceTarballBuildSaysUnknownAndAModifiedCheckoutSaysSo() {
        // a tarball build: the pom's defaults, commit "unknown", dirty "false"
        Properties tarball = new Properties();
        tarball.setProperty("version", "0.1.0-SNAPSHOT");
        tarball.setProperty("commit", "unknown");
        tarball.setProperty("dirty", "false");
        assertThat(ToolVersion.from(tarball).commitText()).isEqualTo("unknown");
        Properties modified = new Properties();
        modified.setProperty("version", "0.1.0-SNAPSHOT");
        modified.setProperty("commit", "b13c164379ff4ed17f5030e64ecc431277d84430");
        modified.setProperty("dirty", "true");
        assertThat(ToolVersion.from(modified).commitText()).isEqualTo("b13c164379ff4ed17f5030e64ecc431277d84430-dirty");
    }

    /** The output of a git command, or null when git cannot be run. */
    private static String git(Path dir, String... args) throws InterruptedException {
        try {
            String[] command = new String[args.length + 1];
            command[0] = "git";
            System.arraycopy(args, 0, command, 1, args.length);
            Process p = new ProcessBuilder(command).directory(dir.toFile()).redirectErrorStream(true).start();
            String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            return p.waitFor(30, TimeUnit.SECONDS) && p.exitValue() == 0 ? out : null;
        } catch (IOException e) {
            return null;
        }
    }
}
