ALTER TABLE "activity" DROP CONSTRAINT "activity_panel_id_panels_id_fk";
