import { Router } from "express";
import { acknowledgeInput, commentInput, falseAlarmInput, timelineQuery, triggersQuery } from "../../shared/api/triggers.ts";
import { idParams } from "../../shared/api/grids.ts";
import { parseInput } from "../http/validate.ts";
import { securedRoutes, type RouteEntry } from "../http/route-table.ts";
import { actorOf } from "../auth/current-user.ts";
import type { TriggerService } from "../services/trigger.service.ts";
import type { RuleMapService } from "../rules/rule-map.service.ts";

export function createTriggersRouter(triggers: TriggerService, maps: RuleMapService, table: RouteEntry[]): Router {
  const router = Router();
  const routes = securedRoutes(router, "/api/triggers", table);

  routes.get("/", "triggers.read", async (req, res) => {
    res.json({ triggers: await triggers.list(parseInput(triggersQuery, req.query, "query")) });
  });

  routes.get("/:id", "triggers.read", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    res.json({ trigger: await triggers.detail(id) });
  });

  // The matched area of one frame of the trigger: a bit per grid point (1 = met in the zone).
  routes.get("/:id/frames/:frameId/mask", "triggers.read", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    const { id: frameId } = parseInput(idParams, { id: req.params.frameId }, "params");
    res.json(await maps.triggerMask(id, frameId));
  });

  routes.post("/:id/acknowledge", "triggers.acknowledge", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    const { note } = parseInput(acknowledgeInput, req.body, "body");
    res.json({ trigger: await triggers.acknowledge(actorOf(req), id, note) });
  });

  routes.post("/:id/comments", "triggers.comment", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    const { text } = parseInput(commentInput, req.body, "body");
    res.status(201).json({ trigger: await triggers.comment(actorOf(req), id, text) });
  });

  routes.post("/:id/false-alarm", "triggers.close", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    const { reason } = parseInput(falseAlarmInput, req.body, "body");
    res.json({ trigger: await triggers.closeAsFalseAlarm(actorOf(req), id, reason) });
  });

  return router;
}

export function createTimelineRouter(triggers: TriggerService, table: RouteEntry[]): Router {
  const router = Router();
  securedRoutes(router, "/api/timeline", table).get("/", "triggers.read", async (req, res) => {
    const q = parseInput(timelineQuery, req.query, "query");
    res.json({ entries: await triggers.timeline(q.limit, q.before) });
  });
  return router;
}
