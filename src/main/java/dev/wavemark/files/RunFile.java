package dev.wavemark.files;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.databind.JsonNode;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.gas.Gas;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.Calibration;
import dev.wavemark.core.model.Optics;
import dev.wavemark.core.model.RunSpec;
import dev.wavemark.core.model.Tunnel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.jspecify.annotations.Nullable;

/**
 * The contract's run file ({@code *.run.json}), the input of {@code analyze}. Relative paths are
 * resolved against the run file's own folder.
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record RunFile(
    @Nullable String label, @Nullable GasJson gas, @Nullable ImagesJson images,
    /** A path (string) or an inline calibration object. */
    @Nullable JsonNode calibration,
    @Nullable String optics, @Nullable ModelJson model, @Nullable TunnelJson tunnel) {

  @JsonInclude(JsonInclude.Include.NON_NULL)
  public record GasJson(@Nullable Double gamma) {}

  @JsonInclude(JsonInclude.Include.NON_NULL)
  public record ImagesJson(@Nullable List<String> frames, @Nullable String noFlowReference, @Nullable String frameRange) {}

  @JsonInclude(JsonInclude.Include.NON_NULL)
  public record TunnelJson(@Nullable Double nominalMach, @Nullable Double machTolerance, @Nullable PitotJson pitot) {}

  @JsonInclude(JsonInclude.Include.NON_NULL)
  public record PitotJson(@Nullable Double totalPressurePa, @Nullable Double pitotPressurePa, @Nullable Double staticPressurePa) {}

  public static RunFile read(Path file) {
    return Json.read(file, RunFile.class, "run file");
  }

  public void write(Path file) {
    Json.write(file, this);
  }

  /**
   * Validates the run file and converts it to the domain record. Every message names the run
   * file and the field.
   *
   * @param file the run file's own path, for resolving relative paths and for messages
   */
  public RunSpec toDomain(Path file) {
    String src = file.toString();
    Path dir = file.toAbsolutePath().getParent();
    if (images == null || images.frames == null || images.frames.isEmpty()) {
      throw new WavemarkException(Problem.JSON_INVALID, src, "images.frames must list at least one image file");
    }
    List<Path> frames = new ArrayList<>();
    for (String f : images.frames) {
      frames.add(dir.resolve(f).normalize());
    }
    Optional<Path> reference = Optional.ofNullable(images.noFlowReference).map(r -> dir.resolve(r).normalize());
    double gamma = gas == null || gas.gamma == null ? 1.4 : gas.gamma;
    Gas g;
    try {
      g = new Gas(gamma);
    } catch (WavemarkException e) {
      throw new WavemarkException(Problem.JSON_INVALID, src, "gas.gamma: " + e.getMessage());
    }
    Optics o = Optics.AUTO;
    if (optics != null) {
      o = Optics.fromContract(optics);
      if (o == null) {
        throw new WavemarkException(Problem.JSON_INVALID, src,
            "optics '" + optics + "' is not one of schlieren-vertical-edge, schlieren-horizontal-edge, shadowgraph, auto");
      }
    }
    if (model == null) {
      throw new WavemarkException(Problem.JSON_INVALID, src, "the 'model' object is required");
    }
    BodyShape shape = model.toDomain(src);
    double tolRad = Math.toRadians(model.angleToleranceDeg() == null ? 0 : model.angleToleranceDeg());
    if (!(tolRad >= 0)) {
      throw new WavemarkException(Problem.JSON_INVALID, src, "model.angleToleranceDeg must be zero or positive");
    }
    return new RunSpec(
        label == null ? file.getFileName().toString() : label, g, frames, reference,
        Optional.ofNullable(images.frameRange), calibrationDomain(dir, src), o, shape, tolRad, tunnelDomain());
  }

  private Calibration calibrationDomain(Path dir, String src) {
    if (calibration == null || calibration.isNull()) {
      return Calibration.NONE;
    }
    if (calibration.isTextual()) {
      Path p = dir.resolve(calibration.asText()).normalize();
      if (!Files.exists(p)) {
        throw new WavemarkException(Problem.FILE_MISSING, p, dir);
      }
      return CalibrationFile.read(p).toDomain(p.toString());
    }
    try {
      return Json.MAPPER.treeToValue(calibration, CalibrationFile.class).toDomain(src);
    } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
      throw new WavemarkException(Problem.JSON_INVALID, src, "calibration: " + e.getOriginalMessage());
    }
  }

  private Tunnel tunnelDomain() {
    if (tunnel == null) {
      return Tunnel.NONE;
    }
    Optional<Tunnel.Pitot> p = Optional.ofNullable(tunnel.pitot).map(x -> new Tunnel.Pitot(
        Optional.ofNullable(x.totalPressurePa), Optional.ofNullable(x.pitotPressurePa), Optional.ofNullable(x.staticPressurePa)));
    return new Tunnel(Optional.ofNullable(tunnel.nominalMach), Optional.ofNullable(tunnel.machTolerance), p);
  }
}
