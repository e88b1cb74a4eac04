package org.holdfast.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.LinkedHashMap;
import java.util.Map;

import org.junit.jupiter.api.Test;

import org.holdfast.cli.BenchCommand;

class BenchCommandTest {

    @Test
    void textFiguresBecomeNumbersWithTheirNoteBeside() {
        Map<String, Object> in = new LinkedHashMap<>();
        in.put("render_fps_flat_1080p", "15.16 frames/s (target >= 20: missed by 24%)");
        in.put("pair_interactions_per_s", "1.826e+08");
        in.put("window_skipped", "no display");
        in.put("cores", 2);
        Map<String, Object> out = BenchCommand.numeric(in);
        assertEquals(15.16, out.get("render_fps_flat_1080p"));
        assertEquals("15.16 frames/s (target >= 20: missed by 24%)", out.get("render_fps_flat_1080p_note"));
        assertEquals(1.826e8, out.get("pair_interactions_per_s"));
        assertFalse(out.containsKey("pair_interactions_per_s_note"));
        assertEquals("no display", out.get("window_skipped"));
        assertEquals(2, out.get("cores"));
    }
}
