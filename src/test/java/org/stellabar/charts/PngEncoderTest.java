package org.stellabar.charts;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Ellipse2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.util.Random;
import javax.imageio.ImageIO;
import javax.imageio.ImageReader;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.stream.ImageInputStream;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;
import org.w3c.dom.Node;

/** Our PNG encoder read back by an independent decoder (the JDK's Image I/O). */
class PngEncoderTest {

    private static BufferedImage sample(int width, int height) {
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, width, height);
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        Random random = new Random(7);
        for (int i = 0; i < 40; i++) {
            g.setColor(new Color(random.nextInt(0xffffff)));
            g.fill(new Ellipse2D.Double(random.nextInt(width), random.nextInt(height), 30, 20));
        }
        g.dispose();
        // a few pixels of noise: rows that no filter predicts, and every byte value
        for (int i = 0; i < 2000; i++) {
            image.setRGB(random.nextInt(width), random.nextInt(height), random.nextInt(0x1000000));
        }
        return image;
    }

    @Test
    void decodesToTheSamePixelsWithResolutionAndTitle() throws Exception {
        // 700 x 300 px RGB is 630 kB before compression: several IDAT chunks of 64 kB
        BufferedImage image = sample(700, 300);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        PngEncoder.write(image, 11811, "Γ₁ and β — a title", out);

        try (ImageInputStream in = ImageIO.createImageInputStream(new ByteArrayInputStream(out.toByteArray()))) {
            ImageReader reader = ImageIO.getImageReadersByFormatName("png").next();
            reader.setInput(in);
            BufferedImage back = reader.read(0);
            assertEquals(700, back.getWidth());
            assertEquals(300, back.getHeight());
            assertArrayEquals(image.getRGB(0, 0, 700, 300, null, 0, 700), back.getRGB(0, 0, 700, 300, null, 0, 700));
            IIOMetadata metadata = reader.getImageMetadata(0);
            Node root = metadata.getAsTree("javax_imageio_png_1.0");
            Element phys = child(root, "pHYs");
            assertEquals("11811", phys.getAttribute("pixelsPerUnitXAxis"));
            assertEquals("11811", phys.getAttribute("pixelsPerUnitYAxis"));
            assertEquals("meter", phys.getAttribute("unitSpecifier"));
            Element text = child(child(root, "iTXt"), "iTXtEntry");
            assertEquals("Title", text.getAttribute("keyword"));
            assertEquals("Γ₁ and β — a title", text.getAttribute("text"));
        }
    }

    @Test
    void equalImagesGiveEqualBytes() throws Exception {
        ByteArrayOutputStream a = new ByteArrayOutputStream();
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        PngEncoder.write(sample(200, 100), 11811, "", a);
        PngEncoder.write(sample(200, 100), 11811, "", b);
        assertArrayEquals(a.toByteArray(), b.toByteArray());
    }

    /**
     * The image data is the zlib stream zlib itself writes: the IDAT chunks joined inflate (the
     * inflater checks the header's check bits and the Adler-32 trailer), and deflating the inflated
     * bytes in one go with zlib's own wrapper at the encoder's level gives the same bytes, header and
     * trailer included. Sizes from one chunk to many, images mostly blank and mostly noise.
     */
    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.CsvSource({"1, 1, 0", "37, 5, 10", "700, 300, 2000", "1050, 788, 200000",
        "300, 200, 60000"})
    void imageDataIsZlibsOwnStream(int width, int height, int noise) throws Exception {
        BufferedImage image = sample(width, height);
        Random random = new Random(width);
        for (int i = 0; i < noise; i++) {
            image.setRGB(random.nextInt(width), random.nextInt(height), random.nextInt(0x1000000));
        }
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        PngEncoder.write(image, 11811, "", out);
        byte[] png = out.toByteArray();
        ByteArrayOutputStream stream = new ByteArrayOutputStream();
        for (int at = 8; at < png.length;) {
            int length = java.nio.ByteBuffer.wrap(png, at, 4).getInt();
            String type = new String(png, at + 4, 4, java.nio.charset.StandardCharsets.US_ASCII);
            if (type.equals("IDAT")) {
                stream.write(png, at + 8, length);
            }
            at += 12 + length;
        }
        byte[] zlib = stream.toByteArray();
        java.util.zip.Inflater inflater = new java.util.zip.Inflater();
        inflater.setInput(zlib);
        byte[] filtered = new byte[(1 + 3 * width) * height];
        int n = inflater.inflate(filtered);
        assertEquals(filtered.length, n);
        assertEquals(true, inflater.finished());
        inflater.end();
        java.util.zip.Deflater deflater = new java.util.zip.Deflater(3);
        deflater.setInput(filtered);
        deflater.finish();
        ByteArrayOutputStream again = new ByteArrayOutputStream();
        byte[] buffer = new byte[1 << 16];
        while (!deflater.finished()) {
            again.write(buffer, 0, deflater.deflate(buffer));
        }
        deflater.end();
        assertArrayEquals(again.toByteArray(), zlib);
    }

    /** Adler-32 with runs of zeros taken in one step agrees with the JDK's (zlib's) Adler-32. */
    @Test
    void adlerOfRunsAgreesWithZlib() {
        Random random = new Random(11);
        for (int trial = 0; trial < 200; trial++) {
            PngEncoder.AdlerSum ours = new PngEncoder.AdlerSum();
            java.util.zip.Adler32 zlib = new java.util.zip.Adler32();
            for (int part = 0; part < 20; part++) {
                if (random.nextBoolean()) {
                    int n = random.nextInt(random.nextBoolean() ? 10 : 200_000);
                    ours.zeros(n);
                    zlib.update(new byte[n]);
                } else {
                    byte[] data = new byte[random.nextInt(random.nextBoolean() ? 10 : 20_000)];
                    random.nextBytes(data);
                    if (random.nextBoolean()) {
                        java.util.Arrays.fill(data, (byte) 0xff);
                    }
                    int from = data.length == 0 ? 0 : random.nextInt(data.length);
                    ours.bytes(data, from, data.length);
                    zlib.update(data, from, data.length - from);
                }
            }
            assertEquals((int) zlib.getValue(), ours.value());
        }
    }

    /**
     * The deferred reduction: sums grown towards the bounds (millions of 0xff bytes, runs of
     * zeros up to 2^31 - 1, as no chart gives) still give the checksum of the definition, each
     * step reduced modulo 65521 at once (RFC 1950, section 8.2).
     */
    @Test
    void adlerStaysExactWhenItsSumsGrowLarge() {
        Random random = new Random(12);
        byte[] ones = new byte[3_000_000];
        java.util.Arrays.fill(ones, (byte) 0xff);
        for (int trial = 0; trial < 20; trial++) {
            PngEncoder.AdlerSum ours = new PngEncoder.AdlerSum();
            long a = 1;
            long b = 0;
            for (int part = 0; part < 12; part++) {
                if (random.nextBoolean()) {
                    long n = random.nextInt(Integer.MAX_VALUE);
                    ours.zeros(n);
                    b = (b + n % 65521 * a) % 65521;
                } else {
                    int length = random.nextInt(ones.length);
                    ours.bytes(ones, 0, length);
                    for (int i = 0; i < length; i++) {
                        a = (a + 0xff) % 65521;
                        b = (b + a) % 65521;
                    }
                }
            }
            assertEquals((int) (b << 16 | a), ours.value());
        }
    }

    private static Element child(Node parent, String name) {
        for (Node n = parent.getFirstChild(); n != null; n = n.getNextSibling()) {
            if (n.getNodeName().equals(name)) {
                return (Element) n;
            }
        }
        throw new AssertionError("no " + name + " under " + parent.getNodeName());
    }
}
