package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.lang.reflect.Method;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * The launcher names methods in JIT compile commands; the JVM silently ignores a command whose method no longer
 * exists, so a rename would quietly bring back the compilation cost the command was measured to save.
 */
class LauncherCompileCommandsTest {

    private static final Pattern COMMAND = Pattern.compile("CompileCommand=dontinline,([\\w.$]+)::(\\w+)");

    @Test
    void everyMethodTheLauncherNamesInACompileCommandExists() throws IOException, ClassNotFoundException {
        // the tests run from the module directory; the launcher lies at the root of the checkout
        Path launcher = Path.of("").toAbsolutePath().getParent().resolve("convgrid");
        String script = Files.readString(launcher, StandardCharsets.UTF_8);
        List<String> named = new ArrayList<>();
        Matcher m = COMMAND.matcher(script);
        while (m.find()) {
            if (script.lastIndexOf('\n', m.start()) > script.lastIndexOf('#', m.start())) {
                // outside a comment: a command the launcher passes
                named.add(m.group(1) + "::" + m.group(2));
                Class<?> owner = Class.forName(m.group(1));
                String method = m.group(2);
                assertThat(Arrays.stream(owner.getDeclaredMethods()).map(Method::getName))
                        .as("%s in the launcher's compile commands", m.group())
                        .contains(method);
            }
        }
        assertThat(named).contains(
                "org.convgrid.engine.physics.atmosphere.GreyAtmosphere$Column::computeDerivatives");
    }
}
