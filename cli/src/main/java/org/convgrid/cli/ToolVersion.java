package org.convgrid.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Properties;
import picocli.CommandLine.IVersionProvider;

/**
 * The version and git commit this build of convgrid was made from. The build writes both into
 * {@code build-provenance.properties} beside this class (Maven resource filtering, see cli/pom.xml); a build
 * outside a git checkout, or classes compiled without the filtering, say {@value #UNKNOWN}.
 */
public final class ToolVersion implements IVersionProvider {

    /** Said for a version or commit the build did not know. */
    public static final String UNKNOWN = "unknown";

    /** Appended to the commit when the working tree had changes not yet committed (git's own word for it). */
    static final String MODIFIED_SUFFIX = "-dirty";

    private static final String RESOURCE = "build-provenance.properties";

    private static final ToolVersion CURRENT = load();

    private final String version;
    private final String commit;

    private ToolVersion(String version, String commit) {
        this.version = version;
        this.commit = commit;
    }

    /** For picocli, which instantiates the provider itself. */
    public ToolVersion() {
        this(CURRENT.version, CURRENT.commit);
    }

    /** The version, such as "0.1.0-SNAPSHOT". */
    public static String current() {
        return CURRENT.version;
    }

    /**
     * The full commit id the jar was built from, with {@value #MODIFIED_SUFFIX} appended when the working tree
     * had uncommitted changes, or {@value #UNKNOWN}.
     */
    public static String commit() {
        return CURRENT.commit;
    }

    @Override
    public String[] getVersion() {
        return new String[] {"convgrid " + version, "commit " + commit};
    }

    /** Reads the provenance the build filtered into {@code properties} (placeholders left unfilled are unknown). */
    static ToolVersion from(Properties properties) {
        String version = known(properties.getProperty("version"));
        String commit = known(properties.getProperty("commit"));
        if (!commit.equals(UNKNOWN) && Boolean.parseBoolean(properties.getProperty("dirty"))) {
            commit += MODIFIED_SUFFIX;
        }
        return new ToolVersion(version, commit);
    }

    String versionText() {
        return version;
    }

    String commitText() {
        return commit;
    }

    private static String known(String value) {
        return value == null || value.isBlank() || value.contains("${") ? UNKNOWN : value.strip();
    }

    private static ToolVersion load() {
        Properties properties = new Properties();
        try (InputStream in = ToolVersion.class.getResourceAsStream(RESOURCE)) {
            if (in != null) {
                properties.load(in);
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + RESOURCE + " from the jar", e);
        }
        return from(properties);
    }
}
