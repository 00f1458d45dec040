package org.statesum.api.request;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.net.http.HttpResponse;
import java.util.Collections;
import org.junit.jupiter.api.Test;
import org.statesum.testing.OpsFixtures;
import org.statesum.testing.TestServer;

/**
 * A body with a great many bad fields gets one bounded problem: the first 10 000 are listed and the
 * detail says there are more. (Collecting problems once took time quadratic in their number: a body of
 * a million unknown members held a core for over ten minutes.)
 */
class ManyProblemsApiTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    private static JsonNode post(String body) throws Exception {
        HttpResponse<String> response = OpsFixtures.post(TestServer.shared().port(), "/v1/spectrum",
                "application/json", body);
        assertEquals(422, response.statusCode());
        return JSON.readTree(response.body());
    }

    @Test
    void manyUnknownMembersAreListedUpToTheCap() throws Exception {
        StringBuilder body = new StringBuilder("{\"levels\":{\"energies\":[0,1]},\"energyUnit\":\"K\","
                + "\"temperatures\":{\"values\":[300]}");
        for (int i = 0; i < 50_000; i++) {
            body.append(",\"extra").append(i).append("\":1");
        }
        JsonNode problem = post(body.append('}').toString());
        assertEquals(ProblemException.MAX_LISTED_ERRORS, problem.get("errors").size());
        assertEquals("/extra0", problem.at("/errors/0/pointer").asText());
        assertEquals("more than 10000 fields are invalid; the first 10000 are listed in errors",
                problem.get("detail").asText());
    }

    @Test
    void manyNonFiniteNumbersAreListedUpToTheCap() throws Exception {
        String nans = String.join(",", Collections.nCopies(30_000, "NaN"));
        JsonNode problem = post("{\"levels\":{\"energies\":[" + nans + "]},\"energyUnit\":\"K\","
                + "\"temperatures\":{\"values\":[300]}}");
        assertEquals(ProblemException.MAX_LISTED_ERRORS, problem.get("errors").size());
        assertEquals("/levels/energies/9999", problem.at("/errors/9999/pointer").asText());
        assertTrue(problem.get("detail").asText().startsWith("more than 10000"));
    }

    @Test
    void belowTheCapEveryProblemIsListedOnceAtItsPointer() {
        Fields fields = new Fields();
        for (int i = 0; i < 300; i++) {
            fields.add("/a/" + i, "first");
            fields.add("/a/" + i, "second"); // the first problem at a pointer is the one kept
        }
        assertEquals(300, fields.count());
        ProblemException e = assertThrows(ProblemException.class, fields::throwIfAny);
        assertEquals(300, e.problem().errors().size());
        assertEquals("first", e.problem().errors().get(299).message());
        assertEquals("300 fields are invalid; see errors", e.problem().detail());
    }
}
