import { Router } from "express";
import { contactInput, fakesBehaviourInput, groupInput, notificationsQuery, notifySettingsInput, shiftInput, shiftsQuery } from "../../shared/api/notifications.ts";
import { idParams } from "../../shared/api/grids.ts";
import { parseInput } from "../http/validate.ts";
import { securedRoutes, type RouteEntry } from "../http/route-table.ts";
import { actorOf } from "../auth/current-user.ts";
import { appendAudit } from "../audit/audit-log.ts";
import { writeTransaction } from "../db/data-source.ts";
import type { NotifyServices } from "../notify/notify-module.ts";
import type { AppConfig } from "../config.ts";
import type { DataSource } from "typeorm";
import { z } from "zod";
import { NotFoundError } from "../errors.ts";

const attachmentParams = z.object({ index: z.coerce.number().int().min(0).max(50) });

function contactsRouter(notify: NotifyServices, table: RouteEntry[]): Router {
  const router = Router();
  const routes = securedRoutes(router, "/api/contacts", table);
  routes.get("/", "contacts.read", async (_req, res) => {
    res.json({ contacts: await notify.contacts.listContacts() });
  });
  routes.get("/:id", "contacts.read", async (req, res) => {
    res.json({ contact: await notify.contacts.getContact(parseInput(idParams, req.params, "params").id) });
  });
  routes.post("/", "contacts.write", async (req, res) => {
    res.status(201).json({ contact: await notify.contacts.createContact(actorOf(req), parseInput(contactInput, req.body, "body")) });
  });
  routes.put("/:id", "contacts.write", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    res.json({ contact: await notify.contacts.updateContact(actorOf(req), id, parseInput(contactInput, req.body, "body")) });
  });
  routes.delete("/:id", "contacts.write", async (req, res) => {
    await notify.contacts.deleteContact(actorOf(req), parseInput(idParams, req.params, "params").id);
    res.status(204).end();
  });
  return router;
}

function groupsRouter(notify: NotifyServices, table: RouteEntry[]): Router {
  const router = Router();
  const routes = securedRoutes(router, "/api/contact-groups", table);
  routes.get("/", "contacts.read", async (_req, res) => {
    res.json({ groups: await notify.contacts.listGroups() });
  });
  routes.post("/", "contacts.write", async (req, res) => {
    res.status(201).json({ group: await notify.contacts.createGroup(actorOf(req), parseInput(groupInput, req.body, "body")) });
  });
  routes.put("/:id", "contacts.write", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    res.json({ group: await notify.contacts.updateGroup(actorOf(req), id, parseInput(groupInput, req.body, "body")) });
  });
  routes.delete("/:id", "contacts.write", async (req, res) => {
    await notify.contacts.deleteGroup(actorOf(req), parseInput(idParams, req.params, "params").id);
    res.status(204).end();
  });
  return router;
}

function onCallRouter(notify: NotifyServices, now: () => Date, table: RouteEntry[]): Router {
  const router = Router();
  const routes = securedRoutes(router, "/api/on-call", table);
  routes.get("/", "oncall.read", async (req, res) => {
    const { from, to } = parseInput(shiftsQuery, req.query, "query");
    res.json({ shifts: await notify.onCall.list(from, to) });
  });
  // Who is on duty right now (the shifts that cover this moment).
  routes.get("/now", "oncall.read", async (_req, res) => {
    const at = now();
    res.json({ at: at.toISOString(), shifts: await notify.onCall.list(at.toISOString(), new Date(at.getTime() + 1).toISOString()) });
  });
  routes.post("/", "oncall.write", async (req, res) => {
    res.status(201).json({ shift: await notify.onCall.create(actorOf(req), parseInput(shiftInput, req.body, "body")) });
  });
  routes.put("/:id", "oncall.write", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    res.json({ shift: await notify.onCall.update(actorOf(req), id, parseInput(shiftInput, req.body, "body")) });
  });
  routes.delete("/:id", "oncall.write", async (req, res) => {
    await notify.onCall.remove(actorOf(req), parseInput(idParams, req.params, "params").id);
    res.status(204).end();
  });
  return router;
}

function outboxRouter(notify: NotifyServices, config: AppConfig, table: RouteEntry[]): Router {
  const router = Router();
  const routes = securedRoutes(router, "/api/notifications", table);
  const settingsDto = async () => ({
    ...(await notify.settings.get()),
    escalationMinutes: config.ESCALATION_MINUTES,
    officeTimeZone: config.OFFICE_TIME_ZONE,
    mailTransport: notify.transportKinds.mail,
    smsTransport: notify.transportKinds.sms,
  });
  routes.get("/", "notifications.read", async (req, res) => {
    res.json({ notifications: await notify.deliveries.list(parseInput(notificationsQuery, req.query, "query")) });
  });
  routes.get("/settings", "contacts.read", async (_req, res) => {
    res.json({ settings: await settingsDto() });
  });
  routes.put("/settings", "notifications.settings", async (req, res) => {
    await notify.settings.update(actorOf(req), parseInput(notifySettingsInput, req.body, "body"));
    res.json({ settings: await settingsDto() });
  });
  routes.get("/:id", "notifications.read", async (req, res) => {
    res.json({ notification: await notify.deliveries.get(parseInput(idParams, req.params, "params").id) });
  });
  routes.post("/:id/resend", "notifications.resend", async (req, res) => {
    res.json({ notification: await notify.deliveries.resend(actorOf(req), parseInput(idParams, req.params, "params").id) });
  });
  return router;
}

/** What the local fakes received (admin only). The two lists are a fixed interface: plain JSON arrays, newest first. */
function fakesRouter(notify: NotifyServices, dataSource: DataSource, now: () => Date, table: RouteEntry[]): Router {
  const router = Router();
  const routes = securedRoutes(router, "/api/fakes", table);
  routes.get("/", "fakes.read", async (_req, res) => {
    res.json({ fakes: notify.fakes.status() });
  });
  routes.get("/mail", "fakes.read", async (_req, res) => {
    res.json(notify.fakes.mail.list());
  });
  // One attachment of a stored e-mail (the map image), so the fakes page can show it.
  routes.get("/mail/:id/attachments/:index", "fakes.read", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    const { index } = parseInput(attachmentParams, req.params, "params");
    const mail = notify.fakes.mail.list().find((m) => m.id === id);
    const content = mail ? notify.fakes.mail.attachment(id, index) : null;
    if (!mail || !content) throw new NotFoundError(`Attachment ${index} of fake mail ${id}`);
    res.type(mail.attachments[index]!.contentType).send(content);
  });
  routes.get("/sms", "fakes.read", async (_req, res) => {
    res.json(notify.fakes.sms.list());
  });
  routes.put("/behaviour", "fakes.control", async (req, res) => {
    const input = parseInput(fakesBehaviourInput, req.body, "body");
    const before = notify.fakes.status();
    const after = notify.fakes.setBehaviour(input);
    await writeTransaction(dataSource, (m) =>
      appendAudit(m, actorOf(req), { action: "fakes.behaviour_changed", targetType: "fakes", targetId: null, before: { mail: before.mail.behaviour, sms: before.sms.behaviour }, after: { mail: after.mail.behaviour, sms: after.sms.behaviour } }, now()),
    );
    res.json({ fakes: after });
  });
  routes.delete("/messages", "fakes.control", async (req, res) => {
    notify.fakes.mail.clear();
    notify.fakes.sms.clear();
    await writeTransaction(dataSource, (m) => appendAudit(m, actorOf(req), { action: "fakes.cleared", targetType: "fakes", targetId: null }, now()));
    res.status(204).end();
  });
  return router;
}

/** Every notification router with the prefix it is mounted at. */
export function createNotificationRouters(deps: { notify: NotifyServices; config: AppConfig; dataSource: DataSource }, table: RouteEntry[]): Array<[string, Router]> {
  const now = deps.notify.now;
  return [
    ["/api/contacts", contactsRouter(deps.notify, table)],
    ["/api/contact-groups", groupsRouter(deps.notify, table)],
    ["/api/on-call", onCallRouter(deps.notify, now, table)],
    ["/api/notifications", outboxRouter(deps.notify, deps.config, table)],
    ["/api/fakes", fakesRouter(deps.notify, deps.dataSource, now, table)],
  ];
}
