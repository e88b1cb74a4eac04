package org.holdfast.film;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import java.util.Optional;

/**
 * Turns a folder of numbered PNG frames into an H.264 video with ffmpeg, when ffmpeg is on the
 * PATH. The 4:2:0 chroma subsampling most players need (yuv420p) halves the colour resolution,
 * so frame sides must be even, which the film options already demand. The video is written
 * under a temporary name and renamed when ffmpeg succeeds.
 */
final class VideoEncoder {

    private VideoEncoder() {
    }

    /** The ffmpeg executable on the PATH, if any. */
    static Optional<Path> ffmpeg() {
        String path = System.getenv("PATH");
        if (path == null) {
            return Optional.empty();
        }
        for (String d : path.split(File.pathSeparator)) {
            Path p = Path.of(d.isEmpty() ? "." : d, "ffmpeg");
            if (Files.isExecutable(p) && !Files.isDirectory(p)) {
                return Optional.of(p);
            }
        }
        return Optional.empty();
    }

    /** The command that encodes the frames, for running or for telling the user. */
    static List<String> command(String ffmpeg, Path frames, int frameRate, Path video) {
        return List.of(ffmpeg, "-y", "-loglevel", "error", "-framerate", Integer.toString(frameRate),
                "-i", frames.resolve("frame_%06d.png").toString(), "-c:v", "libx264", "-pix_fmt", "yuv420p",
                "-f", "mp4", video.toString());
    }

    /**
     * Encodes; returns null on success, else ffmpeg's complaint in one line.
     */
    static String encode(Path ffmpeg, Path frames, int frameRate, Path video) throws IOException, InterruptedException {
        Path abs = video.toAbsolutePath();
        Files.createDirectories(abs.getParent());
        Path tmp = abs.resolveSibling("." + abs.getFileName() + ".part");
        ProcessBuilder pb = new ProcessBuilder(command(ffmpeg.toString(), frames, frameRate, tmp));
        pb.redirectErrorStream(true);
        Process p = pb.start();
        p.getOutputStream().close();
        String said = new String(p.getInputStream().readAllBytes()).strip();
        int code = p.waitFor();
        if (code != 0) {
            Files.deleteIfExists(tmp);
            return said.isEmpty() ? "ffmpeg exited with code " + code : said.lines().reduce((a, b) -> b).orElse(said);
        }
        Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        return null;
    }
}
