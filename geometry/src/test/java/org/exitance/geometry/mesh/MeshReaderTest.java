package org.exitance.geometry.mesh;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Surface;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class MeshReaderTest {

    @TempDir
    Path dir;

    static final String TRIANGLE = """
            solid plate
              facet normal 0 0 1
                outer loop
                  vertex 0 0 0
                  vertex 1000 0 0
                  vertex 0 1000 0
                endloop
              endfacet
              facet normal 0 0 0
                outer loop
                  vertex 1000 0 0
                  vertex 1000 1000 0
                  vertex 0 1000 0
                endloop
              endfacet
              facet normal 0 0 1
                outer loop
                  vertex 0 0 0
                  vertex 0 0 0
                  vertex 0 1000 0
                endloop
              endfacet
            endsolid plate
            solid
              facet normal 0 0 -1
                outer loop
                  vertex 0 0 5
                  vertex 0 1 5
                  vertex 1 0 5
                endloop
              endfacet
            endsolid
            """;

    Path write(String name, String text) throws IOException {
        Path p = dir.resolve(name);
        Files.writeString(p, text, StandardCharsets.US_ASCII);
        return p;
    }

    Path binary(String name, String header, float[][] tris) throws IOException {
        ByteBuffer b = ByteBuffer.allocate(84 + 50 * tris.length).order(ByteOrder.LITTLE_ENDIAN);
        byte[] h = header.getBytes(StandardCharsets.US_ASCII);
        b.put(h, 0, Math.min(80, h.length));
        b.position(80);
        b.putInt(tris.length);
        for (float[] t : tris) {
            for (float v : t) {
                b.putFloat(v);
            }
            b.putShort((short) 0);
        }
        Path p = dir.resolve(name);
        Files.write(p, b.array());
        return p;
    }

    @Test
    void asciiStlGivesOneSurfacePerSolidScalesAndDropsDegenerateTriangles() throws IOException {
        MeshImport m = StlReader.read(write("part.stl", TRIANGLE), MeshOptions.defaults().withScale(0.001));
        assertThat(m.surfaces()).extracting(Surface::name).containsExactly("plate", "part.2");
        assertThat(m.surfaces().get(0).area()).isCloseTo(1.0, within(1e-12)); // 1000 mm square = 1 m²
        assertThat(m.droppedDegenerate()).isEqualTo(1);
        assertThat(m.notes()).anySatisfy(n -> assertThat(n).contains("dropped 1 zero-area"));
        assertThat(m.surfaces().get(1).facets().get(0).normal().z()).isEqualTo(-1.0);
    }

    @Test
    void binaryStlIsDetectedEvenWhenItsHeaderStartsWithSolid() throws IOException {
        float[][] tris = {{0, 0, 1, 0, 0, 0, 1, 0, 0, 0, 1, 0}, {0, 0, 0, 1, 0, 0, 1, 1, 0, 0, 1, 0}};
        MeshImport m = StlReader.read(binary("bin.stl", "solid looks like ascii", tris), MeshOptions.defaults());
        assertThat(m.surfaces()).hasSize(1);
        assertThat(m.surfaces().get(0).name()).isEqualTo("bin");
        assertThat(m.surfaces().get(0).facets()).hasSize(2);
        assertThat(m.surfaces().get(0).area()).isCloseTo(1.0, within(1e-7));
    }

    @Test
    void invertedStlFacetIsAnErrorUnlessAPolicyRepairsIt() throws IOException {
        float[][] tris = {{0, 0, 1, 0, 0, 0, 1, 0, 0, 0, 1, 0}, {0, 0, 1, 1, 0, 0, 0, 1, 0, 1, 1, 0}};
        Path p = binary("flip.stl", "x", tris);
        assertThatThrownBy(() -> StlReader.read(p, MeshOptions.defaults())).isInstanceOf(MeshFormatException.class)
                .hasMessageContaining("flip.stl").hasMessageContaining("facet 2").hasMessageContaining("inverted");
        MeshImport stored = StlReader.read(p, MeshOptions.defaults().withNormalPolicy(NormalPolicy.USE_STORED_NORMAL));
        assertThat(stored.normalConflicts()).isEqualTo(1);
        assertThat(stored.surfaces().get(0).facets()).allSatisfy(f -> assertThat(f.normal().z()).isEqualTo(1.0));
        MeshImport winding = StlReader.read(p, MeshOptions.defaults().withNormalPolicy(NormalPolicy.USE_WINDING));
        assertThat(winding.surfaces().get(0).facets().get(1).normal().z()).isEqualTo(-1.0);
    }

    @Test
    void malformedStlNamesFileAndLine() throws IOException {
        Path p = write("bad.stl", "solid x\n facet normal 0 0 1\n outer loop\n vertex 0 0 zero\n");
        assertThatThrownBy(() -> StlReader.read(p, MeshOptions.defaults())).isInstanceOf(MeshFormatException.class)
                .hasMessageContaining("bad.stl").hasMessageContaining("line 4").hasMessageContaining("zero");
        Path q = write("junk.stl", "hello world, this is not a mesh");
        assertThatThrownBy(() -> StlReader.read(q, MeshOptions.defaults())).hasMessageContaining("junk.stl");
    }

    @Test
    void objGroupsPolygonsAndNegativeIndices() throws IOException {
        String obj = """
                # invented demo data
                v 0 0 0
                v 1 0 0
                v 1 1 0
                v 0 1 0
                f 1 2 3 4
                g lid
                v 0 0 1
                v 0 1 1
                v 1 1 1
                v 1 0 1
                f -4/1/1 -3/2/1 -2/3/1 -1/4/1
                o warped
                v 0 0 2
                v 1 0 2
                v 1 1 2.5
                v 0 1 2
                f 9//1 10//1 11//1 12//1
                g notch
                v 0 0 3
                v 2 0 3
                v 2 2 3
                v 1 0.5 3
                v 0 2 3
                f 13 14 15 16 17
                """;
        MeshImport m = ObjReader.read(write("room.obj", obj), MeshOptions.defaults());
        assertThat(m.surfaces()).extracting(Surface::name).containsExactly("room", "lid", "warped", "notch");
        assertThat(m.surfaces().get(0).facets()).hasSize(1);
        assertThat(m.surfaces().get(1).facets().get(0).normal().z()).isEqualTo(-1.0);
        assertThat(m.surfaces().get(2).facets()).hasSize(2); // non-planar quad split
        Surface notch = m.surfaces().get(3);
        assertThat(notch.facets()).hasSize(3); // non-convex pentagon: ear clipping gives n − 2 triangles
        // shoelace area of the pentagon (0,0),(2,0),(2,2),(1,0.5),(0,2): 4 − 1.5 = 2.5 (elementary geometry)
        assertThat(notch.area()).isCloseTo(2.5, within(1e-12));
        assertThat(m.splitPolygons()).isEqualTo(2);
        assertThat(notch.facets()).extracting(Facet::normal).allSatisfy(n -> assertThat(n.z()).isEqualTo(1.0));
    }

    @Test
    void objErrorsNameFileAndLine() throws IOException {
        Path p = write("bad.obj", "v 0 0 0\nv 1 0 0\nv 0 1 0\nf 1 2 7\n");
        assertThatThrownBy(() -> ObjReader.read(p, MeshOptions.defaults())).isInstanceOf(MeshFormatException.class)
                .hasMessageContaining("bad.obj").hasMessageContaining("line 4").hasMessageContaining("out of range");
        Path q = write("few.obj", "v 0 0 0\nv 1 0 0\nf 1 2\n");
        assertThatThrownBy(() -> ObjReader.read(q, MeshOptions.defaults())).hasMessageContaining("line 3");
        Path r = write("empty.obj", "v 0 0 0\nv 1 0 0\nv 2 0 0\nf 1 2 3\n");
        assertThatThrownBy(() -> ObjReader.read(r, MeshOptions.defaults())).hasMessageContaining("no usable");
    }
}
