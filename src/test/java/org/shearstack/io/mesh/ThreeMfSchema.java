package org.shearstack.io.mesh;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import javax.xml.XMLConstants;
import javax.xml.transform.stream.StreamSource;
import javax.xml.validation.Schema;
import javax.xml.validation.SchemaFactory;

/**
 * The published 3MF core schema (../shared/standards/3mf/3mf-core-1.4.0.xsd, 3MF Consortium spec_core tag 1.4.0),
 * compiled with the two JDK work-arounds from that folder's README: the xml: namespace import is answered by
 * a local schema declaring xml:lang and xml:space, and maxOccurs="2147483647" becomes "unbounded" in memory.
 */
public final class ThreeMfSchema {

    private ThreeMfSchema() {
    }

    /** The schema folder, or null when it is absent (tests then skip with a message). */
    public static Path folder() {
        Path p = Path.of(System.getProperty("user.dir")).resolve("../shared/standards/3mf").normalize();
        return Files.isRegularFile(p.resolve("3mf-core-1.4.0.xsd")) ? p : null;
    }

    public static Schema core(Path folder) throws Exception {
        Path xmlXsd = Files.createTempFile("xml-ns", ".xsd");
        Files.writeString(xmlXsd, "<xs:schema xmlns:xs=\"http://www.w3.org/2001/XMLSchema\" "
                + "targetNamespace=\"http://www.w3.org/XML/1998/namespace\">"
                + "<xs:attribute name=\"lang\" type=\"xs:language\"/>"
                + "<xs:attribute name=\"space\"><xs:simpleType><xs:restriction base=\"xs:NCName\">"
                + "<xs:enumeration value=\"default\"/><xs:enumeration value=\"preserve\"/></xs:restriction>"
                + "</xs:simpleType></xs:attribute></xs:schema>");
        xmlXsd.toFile().deleteOnExit();
        String core = Files.readString(folder.resolve("3mf-core-1.4.0.xsd"), StandardCharsets.UTF_8)
                .replace("maxOccurs=\"2147483647\"", "maxOccurs=\"unbounded\"")
                .replace("schemaLocation=\"http://www.w3.org/2001/xml.xsd\"",
                        "schemaLocation=\"" + xmlXsd.toUri() + "\"");
        SchemaFactory f = SchemaFactory.newInstance(XMLConstants.W3C_XML_SCHEMA_NS_URI);
        f.setProperty(XMLConstants.ACCESS_EXTERNAL_SCHEMA, "file");
        StreamSource src = new StreamSource(new StringReader(core));
        src.setSystemId(folder.resolve("3mf-core-1.4.0.xsd").toUri().toString());
        return f.newSchema(src);
    }

    public static void validate(Schema schema, String xml) throws IOException, org.xml.sax.SAXException {
        schema.newValidator().validate(new StreamSource(new StringReader(xml)));
    }
}
