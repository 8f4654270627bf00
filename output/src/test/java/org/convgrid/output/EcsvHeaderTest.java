package org.convgrid.output;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.snakeyaml.engine.v2.api.Load;
import org.snakeyaml.engine.v2.api.LoadSettings;

class EcsvHeaderTest {

    private static final List<EcsvColumn> COLUMNS = List.of(new EcsvColumn("a", "", "float64", "the one's column"),
            new EcsvColumn("b", "cm / s", "int64", "speed"));

    @Test
    void withoutMetaTheHeaderIsTheCataloguesLayout() {
        assertThat(EcsvHeader.of(COLUMNS)).isEqualTo("""
                # %ECSV 1.0
                # ---
                # delimiter: ','
                # datatype:
                # - {name: a, datatype: float64, description: 'the one''s column'}
                # - {name: b, unit: 'cm / s', datatype: int64, description: 'speed'}
                # schema: astropy-2.0
                """);
    }

    @Test
    void metaValuesReadBackAsWrittenWhateverTheirCharacters() {
        Map<String, Object> meta = new LinkedHashMap<>();
        meta.put("mass_g", 1.988409870698051e33);
        meta.put("count", 3);
        meta.put("settling", true);
        meta.put("note", "it's a path\nwith a line break and a \"quote\" \\ backslash");
        meta.put("missing", Double.NaN);
        String header = EcsvHeader.of(COLUMNS, meta);
        // every line stays a comment line, so CSV readers skip the whole header
        assertThat(header.lines()).allSatisfy(l -> assertThat(l).startsWith("#"));
        assertThat(header).contains("# meta:\n#   mass_g: 1.988409870698051e+33\n").endsWith("# schema: astropy-2.0\n");
        String yaml = String.join("\n", header.lines().skip(2).map(l -> l.substring(2)).toList());
        @SuppressWarnings("unchecked")
        Map<String, Object> read = (Map<String, Object>) ((Map<String, Object>) new Load(LoadSettings.builder()
                .build()).loadFromString(yaml)).get("meta");
        assertThat(read.get("mass_g")).isEqualTo(1.988409870698051e33);
        assertThat(read.get("count")).isEqualTo(3);
        assertThat(read.get("settling")).isEqualTo(true);
        assertThat(read.get("note")).isEqualTo(meta.get("note"));
        assertThat(read).containsKey("missing");
    }
}
