package org.shapetrail.store;

import org.junit.jupiter.api.Tag;

/** The repositories' contract on the real PostgreSQL server .ci/run starts, each test in a schema of its own. */
@Tag("server")
class RepositoryServerTest extends RepositoryContract {
    @Override
    Database fresh(String label) {
        return Database.open(TestServer.freshSchema(label));
    }
}
