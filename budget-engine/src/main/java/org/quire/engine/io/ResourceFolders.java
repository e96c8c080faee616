package org.quire.engine.io;

import java.io.IOException;
import java.net.URI;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.file.FileSystem;
import java.nio.file.FileSystemAlreadyExistsException;
import java.nio.file.FileSystems;
import java.nio.file.Path;
import java.util.Map;

/**
 * Folders of files shipped with the application on its class path (the shipped templates, the worked examples),
 * as {@link Path}s: inside the jar's own file system when the application runs from its jar, a plain folder when
 * it runs from a build's class folder. The jar's file system is opened once and stays open for the life of the
 * program, so paths handed out stay valid.
 *
 * <p>Thread-safe.
 */
public final class ResourceFolders {
    private ResourceFolders() {
    }

    /**
     * @param name the folder's resource name, without a leading slash, e.g. {@code templates}
     * @return the folder, or null when the application ships none of this name
     */
    public static synchronized Path find(String name) {
        ClassLoader loader = ResourceFolders.class.getClassLoader();
        URL url = loader == null ? ClassLoader.getSystemResource(name) : loader.getResource(name);
        if (url == null) {
            return null;
        }
        try {
            URI uri = url.toURI();
            if ("jar".equals(uri.getScheme())) {
                FileSystem fs;
                try {
                    fs = FileSystems.newFileSystem(uri, Map.of());
                } catch (FileSystemAlreadyExistsException e) {
                    fs = FileSystems.getFileSystem(uri);
                }
                return fs.getPath("/" + name);
            }
            return Path.of(uri);
        } catch (URISyntaxException | IOException | IllegalArgumentException e) {
            return null;
        }
    }
}
