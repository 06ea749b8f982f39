package dev.wavemark.files;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.databind.DeserializationContext;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.deser.std.StdDeserializer;
import com.fasterxml.jackson.databind.module.SimpleModule;
import com.fasterxml.jackson.databind.ser.std.StdSerializer;
import java.io.IOException;
import java.nio.file.Path;

/**
 * The result file's mapper: {@link Json#MAPPER} plus the NaN policy. Jackson writes a NaN double
 * as the string "NaN", which a browser's JSON.parse turns into a string; here a non-finite number
 * is written as null, and a null read into a plain {@code double} comes back as NaN.
 */
final class ResultJson {
  static final ObjectMapper MAPPER = Json.MAPPER.copy().registerModule(nanAsNull());

  private ResultJson() {}

  static ResultFile read(Path file) {
    return Json.read(file, ResultFile.class, "result file", MAPPER);
  }

  private static SimpleModule nanAsNull() {
    SimpleModule m = new SimpleModule("wavemark-nan-as-null");
    StdSerializer<Double> ser = new StdSerializer<>(Double.class) {
      @Override
      public void serialize(Double v, JsonGenerator g, SerializerProvider p) throws IOException {
        if (v == null || !Double.isFinite(v)) {
          g.writeNull();
        } else {
          g.writeNumber(v.doubleValue());
        }
      }
    };
    m.addSerializer(Double.class, ser);
    m.addSerializer(Double.TYPE, ser);
    m.addDeserializer(Double.TYPE, new StdDeserializer<Double>(Double.TYPE) {
      @Override
      public Double deserialize(JsonParser p, DeserializationContext c) throws IOException {
        return p.getValueAsDouble(Double.NaN);
      }

      @Override
      public Double getNullValue(DeserializationContext c) {
        return Double.NaN;
      }
    });
    return m;
  }
}
