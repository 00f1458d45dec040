package org.statesum.api.batch;

import com.fasterxml.jackson.databind.ObjectMapper;
import io.javalin.config.JavalinConfig;
import io.javalin.http.Context;
import java.io.IOException;
import java.io.OutputStream;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CompletionService;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorCompletionService;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicBoolean;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.statesum.api.config.OperationsConfig;
import org.statesum.api.request.FieldError;
import org.statesum.api.request.Problem;
import org.statesum.api.request.ProblemException;
import org.statesum.api.request.ProblemMapper;
import org.statesum.api.server.AnswerBuffer;
import org.statesum.api.server.BodyReader;
import org.statesum.api.server.ComputeGate;
import org.statesum.api.server.ComputeRoutes;
import org.statesum.api.server.JobRunner;
import org.statesum.api.server.MemoryBudget;
import org.statesum.api.server.Operations;
import org.statesum.api.server.OverloadedException;
import org.statesum.api.server.ServiceMetrics;
import org.statesum.engine.DomainException;

/**
 * {@code POST /v1/batch}: runs every job through the compute endpoint registered at its path and streams
 * the answers as NDJSON, one line a job in the order the jobs finish: {@code {id, status, result}} or
 * {@code {id, status, problem}}. At most {@code STATESUM_BATCH_PARALLELISM} jobs of one batch run at
 * once, each in a compute slot shared with direct requests and under the job time limit, the whole batch
 * under the batch time limit. When a line cannot be written (the client has gone), the jobs running are
 * stopped at their next checkpoint and the rest are never started.
 */
public final class BatchController {

    static final String MEDIA_TYPE = "application/x-ndjson";
    private static final Logger LOG = LoggerFactory.getLogger(BatchController.class);

    private final ObjectMapper mapper;
    private final BodyReader bodies;
    private final BatchRequestReader requests;
    private final ComputeGate gate;
    private final JobRunner runner;
    private final ExecutorService workers;
    private final ServiceMetrics metrics;
    private final OperationsConfig ops;

    /** Serves {@code POST /v1/batch} over the compute routes of {@code compute}, on the machinery of {@code operations}. */
    public static void install(JavalinConfig javalin, ObjectMapper mapper, BodyReader bodies, ComputeRoutes compute,
            Operations operations, ProblemMapper problems) {
        OperationsConfig ops = operations.config();
        BatchController batch = new BatchController(mapper, bodies, new BatchRequestReader(compute, ops.maxBatchJobs()),
                operations.gate(), operations.runner(), operations.workers(), operations.metrics(), ops);
        javalin.routes.post(problems.allow("POST", "/v1/batch"), batch::post);
    }

    private BatchController(ObjectMapper mapper, BodyReader bodies, BatchRequestReader requests, ComputeGate gate,
            JobRunner runner, ExecutorService workers, ServiceMetrics metrics, OperationsConfig ops) {
        this.mapper = mapper;
        this.bodies = bodies;
        this.requests = requests;
        this.gate = gate;
        this.runner = runner;
        this.workers = workers;
        this.metrics = metrics;
        this.ops = ops;
    }

    public void post(Context ctx) throws InterruptedException {
        try (ComputeGate.Ticket ticket = gate.open(ctx.req().getRemoteAddr())) {
            List<BatchJob> jobs = requests.read(bodies.read(ctx, ticket));
            ticket.admit();
            long deadline = System.nanoTime() + ops.batchTimeLimitMillis() * 1_000_000L;
            ctx.status(200).contentType(MEDIA_TYPE);
            stream(ctx, jobs, ticket, deadline);
        }
    }

    private void stream(Context ctx, List<BatchJob> jobs, ComputeGate.Ticket ticket, long deadline)
            throws InterruptedException {
        AtomicBoolean gone = new AtomicBoolean();
        CompletionService<Line> done = new ExecutorCompletionService<>(workers);
        Map<Future<Line>, BatchJob> pending = new HashMap<>();
        int next = 0;
        OutputStream out;
        try {
            out = ctx.res().getOutputStream();
        } catch (IOException e) {
            return;
        }
        while (next < jobs.size() && pending.size() < ops.batchParallelism()) {
            BatchJob job = jobs.get(next++);
            pending.put(done.submit(() -> line(job, ticket, deadline, gone)), job);
        }
        while (!pending.isEmpty()) {
            Future<Line> finished = done.take();
            BatchJob finishedJob = pending.remove(finished);
            Line line;
            try {
                line = finished.get();
            } catch (CancellationException e) {
                continue; // a job cancelled after the client left
            } catch (ExecutionException e) {
                if (e.getCause() instanceof CancellationException) {
                    continue;
                }
                // an Error (out of memory, say) that escaped the job: its line still comes, as a 500
                LOG.error("batch job failed unexpectedly", e.getCause());
                metrics.batchJob("failed");
                line = failureLine(finishedJob.id());
            }
            try (MemoryBudget.Share held = line.memory()) {
                line.bytes().writeTo(out);
                out.flush();
            } catch (IOException e) {
                gone.set(true);
                break;
            }
            if (next < jobs.size()) {
                BatchJob job = jobs.get(next++);
                pending.put(done.submit(() -> line(job, ticket, deadline, gone)), job);
            }
        }
        if (gone.get()) {
            // The jobs running see the client gone at their next checkpoint and end; a line one of them
            // still finishes gives its memory back here (a cancelled future would drop it unreleased).
            pending.keySet().forEach(BatchController::release);
            for (int i = next; i < jobs.size(); i++) {
                metrics.batchJob("cancelled");
            }
            LOG.info("batch client gone: {} of {} jobs never started", jobs.size() - next, jobs.size());
        }
    }

    /** One rendered line and the share of the memory budget it holds until it is written (null for none). */
    record Line(AnswerBuffer bytes, MemoryBudget.Share memory) {
    }

    /** Waits for a job whose line will not be written and gives back the memory of its line. */
    private static void release(Future<Line> future) {
        try {
            Line line = future.get();
            if (line.memory() != null) {
                line.memory().close();
            }
        } catch (ExecutionException | CancellationException e) {
            // the job ended without a line: nothing was held
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    /** Computes one job and renders its line; throws CancellationException if the client has gone. */
    private Line line(BatchJob job, ComputeGate.Ticket ticket, long deadline, AtomicBoolean gone)
            throws IOException, InterruptedException {
        if (gone.get()) {
            metrics.batchJob("cancelled");
            throw new CancellationException();
        }
        Map<String, Object> line = new LinkedHashMap<>();
        line.put("id", job.id());
        try {
            if (job.endpoint() == null) {
                throw new ProblemException(Problem.of("not-found", "Not found", 404, "no compute endpoint at path '"
                        + job.path() + "'; see /openapi.yaml", List.of(new FieldError("/path", "unknown path"))));
            }
            if (job.body() == null) {
                throw ProblemException.invalid(List.of(new FieldError("", "is required: the job's request body")));
            }
            try (ComputeGate.Slot slot = ticket.slot()) {
                Object result = runner.run(job.path(), job.endpoint(), job.body(), deadline, gone::get);
                line.put("status", 200);
                line.put("result", result);
                Line rendered = render(line); // in the slot: a large answer is CPU work too
                metrics.batchJob("answered");
                return rendered;
            }
        } catch (CancellationException | InterruptedException e) {
            metrics.batchJob("cancelled");
            throw e instanceof CancellationException c ? c : new CancellationException();
        } catch (RuntimeException e) {
            Problem problem = problemOf(e);
            line.remove("result");
            line.put("status", problem.status());
            line.put("problem", problem);
            metrics.batchJob("failed");
            return small(line);
        }
    }

    /** The line as JSON and a newline, its memory reserved (a 422 or 503 problem when it does not fit). */
    private Line render(Map<String, Object> line) throws IOException {
        MemoryBudget.Share memory = gate.memory();
        boolean kept = false;
        try {
            AnswerBuffer bytes = AnswerBuffer.of(mapper, line, memory);
            bytes.write('\n');
            kept = true;
            return new Line(bytes, memory);
        } catch (IOException e) {
            LOG.error("batch line could not be written", e);
            return failureLine((String) line.get("id"));
        } finally {
            if (!kept) {
                memory.close(); // whatever went wrong, the line holds nothing
            }
        }
    }

    /** The line of a job that failed inside the service: its id, status 500 and a problem without details. */
    private Line failureLine(String id) {
        Map<String, Object> failed = new LinkedHashMap<>();
        failed.put("id", id);
        failed.put("status", 500);
        failed.put("problem", ProblemMapper.fromStatus(500));
        return small(failed);
    }

    /** A line of a few hundred bytes, outside the budget (so that a full budget can still report itself). */
    private Line small(Map<String, Object> line) {
        AnswerBuffer bytes = new AnswerBuffer(null);
        try {
            mapper.writeValue(bytes, line);
        } catch (IOException e) {
            throw new IllegalStateException("a string and a problem are always writable", e);
        }
        bytes.write('\n');
        return new Line(bytes, null);
    }

    /** The problem of a failed job, its pointers relative to the job object ("/body/levels/..."). */
    private static Problem problemOf(RuntimeException e) {
        if (e instanceof OverloadedException o) {
            return o.problem(); // the memory budget was full for now: the job may be sent again
        }
        if (e instanceof ProblemException p) {
            Problem problem = p.problem();
            if (problem.type().endsWith("/not-found")) {
                return problem;
            }
            List<FieldError> errors = problem.errors().stream()
                    .map(f -> new FieldError("/body" + f.pointer(), f.message())).toList();
            return new Problem(problem.type(), problem.title(), problem.status(), problem.detail(), errors);
        }
        if (e instanceof DomainException d) {
            return Problem.of("invalid-request", "Invalid request", 422, d.getMessage(),
                    List.of(new FieldError("/body" + d.field(), d.getMessage())));
        }
        LOG.error("batch job failed unexpectedly", e);
        return ProblemMapper.fromStatus(500);
    }
}
