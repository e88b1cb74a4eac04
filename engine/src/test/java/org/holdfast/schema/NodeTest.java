package org.holdfast.schema;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;

import org.holdfast.schema.ScenarioException;
import org.holdfast.schema.NumberReader;
import org.holdfast.schema.Overrides;
import org.holdfast.schema.Node;
import org.holdfast.schema.ScenarioFile;

class NodeTest {

    private static final Path FILE = Path.of("test.toml");

    private static Node parse(String text, Overrides o) {
        return ScenarioFile.parse(FILE, text, o, NumberReader.PLAIN);
    }

    @Test
    void unknownKeyNamesFileLineAndSuggestion() {
        Node root = parse("name = \"x\"\n\n[run]\nuntil_gyr = 5\nuntill = 3\n", Overrides.none());
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> root.requireTable("run").allowOnly("until_gyr", "until"));
        assertEquals("test.toml:5", e.where());
        assertEquals("run.untill", e.key());
        assertTrue(e.getMessage().contains("did you mean 'until'"), e.getMessage());
    }

    @Test
    void wrongTypeNamesTheKey() {
        Node run = parse("[run]\nuntil_gyr = \"ten\"\n", Overrides.none()).requireTable("run");
        ScenarioException e = assertThrows(ScenarioException.class, () -> run.number("until_gyr"));
        assertEquals("test.toml:2", e.where());
        assertTrue(e.getMessage().contains("expected a number"), e.getMessage());
    }

    @Test
    void overridesReplaceValuesAndGalaxiesAreAddressedByName() {
        Overrides o = Overrides.parse(List.of("run.until_gyr=7", "galaxy.Bo.mass_msun=3e11",
                "galaxy.Bo.position_kpc.1=4"));
        Node root = parse("[run]\nuntil_gyr = 5\n[[galaxy]]\nname = \"Ar\"\nmass_msun = 1e12\n"
                + "[[galaxy]]\nname = \"Bo\"\nmass_msun = 1e11\nposition_kpc = [1, 2, 3]\n", o);
        assertEquals(7, root.requireTable("run").number("until_gyr"));
        List<Node> g = root.tables("galaxy", "name");
        assertEquals(1e12, g.get(0).number("mass_msun"));
        assertEquals(3e11, g.get(1).number("mass_msun"));
        assertArrayEquals(new double[] {1, 4, 3}, g.get(1).vector("position_kpc", 3));
        o.checkAllUsed();
    }

    @Test
    void aProblemWithAnOverriddenValueNamesTheOptionThatGaveIt() {
        Overrides o = Overrides.parse(List.of("galaxy.Bo.mass_msun=-3")).put("galaxy.Bo.position_kpc.1", "4", "--vary");
        Node bo = parse("[[galaxy]]\nname = \"Bo\"\nmass_msun = 1e11\nposition_kpc = [1, 2, 3]\nhalo = 7\n", o)
                .tables("galaxy", "name").get(0);
        ScenarioException mass = assertThrows(ScenarioException.class, () -> bo.positive("mass_msun"));
        assertEquals("--set", mass.where());
        assertEquals("--set: galaxy.Bo.mass_msun: must be > 0 (got -3.00000)", mass.getMessage());
        bo.vector("position_kpc", 3);
        assertEquals("--vary", bo.error("position_kpc", "x").where(), "one component came from --vary");
        assertEquals("test.toml:5", bo.error("halo", "x").where(), "a key the overrides did not touch");
    }

    @Test
    void anUnusedOverrideIsReported() {
        Overrides o = Overrides.parse(List.of("run.untill=7"));
        Node root = parse("[run]\nuntil_gyr = 5\n", o);
        root.requireTable("run").number("until_gyr");
        ScenarioException e = assertThrows(ScenarioException.class, o::checkAllUsed);
        assertEquals("run.untill", e.key());
    }

    @Test
    void syntaxErrorGivesTheLine() {
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> parse("a = 1\nb = = 2\n", Overrides.none()));
        assertEquals("test.toml:2", e.where());
    }

    @Test
    void positiveRejectsZero() {
        Node n = parse("m = 0\n", Overrides.none());
        ScenarioException e = assertThrows(ScenarioException.class, () -> n.positive("m"));
        assertTrue(e.getMessage().contains("must be > 0"), e.getMessage());
    }
}
