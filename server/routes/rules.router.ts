import { Router } from "express";
import { z } from "zod";
import { backtestInput, checkExpression, checkExpressionInput, createRuleInput, previewInput, updateRuleInput } from "../../shared/api/rules.ts";
import { idParams } from "../../shared/api/grids.ts";
import { parseInput } from "../http/validate.ts";
import { securedRoutes, type RouteEntry } from "../http/route-table.ts";
import { actorOf } from "../auth/current-user.ts";
import type { RuleService } from "../services/rule.service.ts";
import type { RuleMapService } from "../rules/rule-map.service.ts";

const enabledInput = z.object({ enabled: z.boolean(), changeNote: z.string().trim().max(500).default("") });

export function createRulesRouter(rules: RuleService, maps: RuleMapService, table: RouteEntry[]): Router {
  const router = Router();
  const routes = securedRoutes(router, "/api/rules", table);

  routes.get("/", "rules.read", async (_req, res) => {
    res.json({ rules: await rules.list() });
  });

  // Live validation for the editor: the same checks the save path runs.
  routes.post("/check", "rules.read", (req, res) => {
    const { expression } = parseInput(checkExpressionInput, req.body, "body");
    res.json(checkExpression(expression));
  });

  routes.post("/preview", "rules.write", async (req, res) => {
    res.json(await maps.preview(parseInput(previewInput, req.body, "body")));
  });

  routes.get("/:id", "rules.read", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    res.json({ rule: await rules.get(id) });
  });

  routes.get("/:id/versions", "rules.read", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    res.json({ versions: await rules.versions(id) });
  });

  routes.post("/", "rules.write", async (req, res) => {
    res.status(201).json({ rule: await rules.create(actorOf(req), parseInput(createRuleInput, req.body, "body")) });
  });

  // Saving an edit appends a new immutable version.
  routes.put("/:id", "rules.write", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    res.json({ rule: await rules.update(actorOf(req), id, parseInput(updateRuleInput, req.body, "body")) });
  });

  routes.post("/:id/enabled", "rules.write", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    const { enabled, changeNote } = parseInput(enabledInput, req.body, "body");
    res.json({ rule: await rules.setEnabled(actorOf(req), id, enabled, changeNote) });
  });

  routes.delete("/:id", "rules.write", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    await rules.archive(actorOf(req), id);
    res.status(204).end();
  });

  routes.post("/:id/backtest", "rules.backtest", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    res.json(await maps.backtest(id, parseInput(backtestInput, req.body, "body")));
  });

  return router;
}
