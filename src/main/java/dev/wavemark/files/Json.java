package dev.wavemark.files;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.exc.MismatchedInputException;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/** The one configured Jackson mapper, and safe reading and atomic writing of JSON files. */
public final class Json {
  /** Shared, thread-safe once configured. Unknown fields are ignored: the contract may be extended. */
  public static final ObjectMapper MAPPER = new ObjectMapper()
      .enable(SerializationFeature.INDENT_OUTPUT)
      .disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES);

  private Json() {}

  /**
   * Reads a JSON file into {@code type}, turning every failure into a one-line
   * {@link WavemarkException} that names the file.
   */
  public static <T> T read(Path file, Class<T> type, String what) {
    try {
      return MAPPER.readValue(Files.readString(file), type);
    } catch (NoSuchFileException e) {
      throw new WavemarkException(Problem.FILE_MISSING, file, file.toAbsolutePath().getParent());
    } catch (MismatchedInputException e) {
      String path = e.getPathReference() == null ? "" : " at " + e.getPathReference().replaceAll(".*\\[\"", "\"").replace("]", "");
      throw new WavemarkException(Problem.JSON_INVALID, file, "not a " + what + path + ": " + e.getOriginalMessage().split("\n")[0]);
    } catch (JsonProcessingException e) {
      throw new WavemarkException(Problem.JSON_INVALID, file, "not a " + what + ": " + e.getOriginalMessage().split("\n")[0]);
    } catch (IOException e) {
      throw new WavemarkException(Problem.FILE_UNREADABLE, file, e.getMessage());
    }
  }

  /** Writes {@code value} as JSON to {@code file} through a temporary file and an atomic move. */
  public static void write(Path file, Object value) {
    try {
      writeAtomically(file, MAPPER.writeValueAsBytes(value));
    } catch (JsonProcessingException e) {
      throw new WavemarkException(Problem.WRITE_FAILED, file, e.getOriginalMessage());
    }
  }

  /**
   * Writes bytes to a sibling temporary file, then moves it into place, so that an interrupted
   * run never leaves a half-written file under the final name.
   */
  public static void writeAtomically(Path file, byte[] bytes) {
    Path abs = file.toAbsolutePath();
    Path tmp = abs.resolveSibling("." + abs.getFileName() + ".part");
    try {
      Files.createDirectories(abs.getParent());
      Files.write(tmp, bytes);
      try {
        Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
      } catch (AtomicMoveNotSupportedException e) {
        Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
      }
    } catch (IOException e) {
      throw new WavemarkException(Problem.WRITE_FAILED, file, e.getMessage());
    }
  }

  /** As {@link #read(Path, Class, String)}, with a differently configured mapper. */
  static <T> T read(Path file, Class<T> type, String what, ObjectMapper mapper) {
    try {
      return mapper.readValue(Files.readString(file), type);
    } catch (NoSuchFileException e) {
      throw new WavemarkException(Problem.FILE_MISSING, file, file.toAbsolutePath().getParent());
    } catch (JsonProcessingException e) {
      throw new WavemarkException(Problem.JSON_INVALID, file, "not a " + what + ": " + e.getOriginalMessage().split("\n")[0]);
    } catch (IOException e) {
      throw new WavemarkException(Problem.FILE_UNREADABLE, file, e.getMessage());
    }
  }
}
