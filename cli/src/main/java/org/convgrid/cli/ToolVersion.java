package org.convgrid.cli;

import picocli.CommandLine.IVersionProvider;

/** The tool version, read from the jar manifest when packaged. */
public final class ToolVersion implements IVersionProvider {

    /** Version string such as "0.1.0-SNAPSHOT", or "development" when run from classes. */
    public static String current() {
        String v = ToolVersion.class.getPackage().getImplementationVersion();
        return v == null ? "development" : v;
    }

    @Override
    public String[] getVersion() {
        return new String[] {"convgrid " + current()};
    }
}
